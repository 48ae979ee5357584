import type { ModelId } from '../../contracts/checkpoints';

/** One input of a live model, in the unit the teacher and the student see. */
export interface LiveModelInputDefinition {
  /** The name a LiveModel's inputs use (`a`, `I`, `z`). */
  name: string;
  /** What it is, in words ("Coil radius"). */
  label: string;
  /** The symbol in LaTeX (`a`, `B_H`), shown beside the slider. */
  symbol: string;
  /** The display unit (`cm`, `mA`, `µT`); empty for a plain count. */
  unit: string;
  /** SI value = display value × siFactor (cm → m is 0.01). */
  siFactor: number;
  /** The starting value, and the range and step a new slider gets. */
  defaultValue: number;
  min: number;
  max: number;
  step: number;
  /** Where the physics stops making sense: 'positive' (a radius), 'non-negative' (turns), 'any'. */
  domain: 'positive' | 'non-negative' | 'any';
  /** Whether it may be swept along the plot's horizontal axis. */
  plottable: boolean;
}

/** A model a live equation card can run: its inputs, its output and the engine function behind it. */
export interface LiveModelDefinition {
  id: ModelId;
  /** The model's name in the picker ("Coil, on its axis"). */
  label: string;
  /** The formula the card shows by default, in LaTeX. */
  latex: string;
  inputs: readonly LiveModelInputDefinition[];
  output: { label: string; symbol: string; unit: string; siFactor: number };
  /** The engine call: inputs in SI by name, output in SI. May throw FieldPointError. */
  compute: (si: Readonly<Record<string, number>>) => number;
}
