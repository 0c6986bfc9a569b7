/**
 * `coppice compare <a> <b>`: compare run b with run a (each a run.json, a run folder, or an output folder whose
 * latest.json names a run). Prints the comparison; exit code 0 every decision check of b holds, 1 a check fails,
 * 2 run b failed or bad input.
 */
import { errors } from '../errors.js';
import { compareRuns } from './compare-runs.js';
import { comparisonText } from './compare-text.js';
import { readRunRecord } from './record-file.js';

const USAGE = 'usage: coppice compare <baseline run> <current run> [--json]';

export async function main(args: string[]): Promise<number> {
  const json = args.includes('--json');
  const paths = args.filter((a) => a !== '--json');
  const unknown = paths.find((a) => a.startsWith('--'));
  if (unknown) throw errors.badArguments('compare', `unknown option ${JSON.stringify(unknown)}; ${USAGE}`);
  if (paths.length !== 2) throw errors.badArguments('compare', `expected two runs, got ${paths.length}; ${USAGE}`);
  const comparison = compareRuns(readRunRecord(paths[0]), readRunRecord(paths[1]));
  process.stdout.write(json ? `${JSON.stringify(comparison, null, 2)}\n` : comparisonText(comparison));
  return comparison.exitCode;
}
