/** Options shared by the residual charts. */
import type { ChartOptions } from './spec.js';

export interface ResidualOptions extends ChartOptions {
  /** Name of the target, used in axis titles. __Default:__ 'target'. */
  readonly targetName?: string;
  /** Unit of the target (e.g. 'days', 'EUR'), appended to axis titles. __Default:__ none. */
  readonly unit?: string;
  /** Most points drawn; larger inputs are drawn from a seeded sample (all rows still count in summaries). __Default:__ 4000. */
  readonly sampleLimit?: number;
  /** Seed of the sample. __Default:__ 1. */
  readonly seed?: number;
}
