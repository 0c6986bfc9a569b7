/**
 * One explained row in the shape `chartContributions` draws: the expected value, each feature's value
 * and contribution, and the output they add up to.
 */
import { errors } from '../errors.js';
import type { Frame } from '../table/frame.js';
import type { Contributions } from './contributions.js';

/** Contributions of one row to one output. */
export interface ContributionWalk {
  readonly expected: number;
  readonly contributions: readonly { readonly feature: string; readonly value: number | string | null; readonly contribution: number }[];
  readonly output: number;
}

/**
 * The `i`-th explained row of `c` for output `output`, with feature values read from `frame` (the frame
 * given to `contributionsOf`).
 * @param output output name (class label or target name). __Default:__ the last output (for two-class
 *   models the second class).
 * @example
 * chartContributions(contributionRow(c, frame, 0), { outputName: c.outputMeaning });
 */
export function contributionRow(c: Contributions, frame: Frame, i: number, output?: string): ContributionWalk {
  if (!(Number.isInteger(i) && i >= 0 && i < c.rows.length)) throw errors.badOption('row', i, `an index from 0 to ${c.rows.length - 1}`);
  const k = output === undefined ? c.outputNames.length - 1 : c.outputNames.indexOf(output);
  if (k < 0) throw errors.badOption('output', output, `one of ${c.outputNames.join(', ')}`);
  const p = c.features.length, row = c.rows[i];
  const contributions = c.features.map((feature, j) => {
    const col = frame.columns[j];
    const value = col.kind === 'categorical' ? (col.codes[row] >= 0 ? col.categories[col.codes[row]] ?? null : null) : Number.isNaN(col.values[row]) ? null : col.values[row];
    return { feature, value, contribution: c.values[k][i * p + j] };
  });
  return { expected: c.expected[k], contributions, output: c.outputs[k][i] };
}
