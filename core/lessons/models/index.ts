/** Live equation-card models: the registry, evaluation, plotting and publish rules. */
export { LIVE_MODELS } from './definitions';
export {
  evaluateLiveModel,
  formatModelNumber,
  formatWithUnit,
  liveModelDefinition,
  liveModelValues,
  LiveModelError,
  plotLiveModel,
} from './evaluate';
export { defaultLiveModel } from './defaults';
export { liveModelProblems } from './problems';
export type { LiveModelDefinition, LiveModelInputDefinition } from './types';
