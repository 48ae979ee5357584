/** Physics widgets for equation cards and sign checks. */
export { GeometryDiagram } from './geometry-diagram';
export { LatexField } from './latex-field';
export { LatexView } from './latex-view';
export { LiveModelCard } from './live-model-card';
export { describeLatexProblem, renderLatex, type LatexParseProblem } from './render-latex';
