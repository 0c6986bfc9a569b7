/**
 * `coppice score <model.json> <extract> --out <file.csv|file.json> [--keep a,b] [--report <file.json>] [--strict]`
 *
 * Reads a saved model and an extract (any format `readExtract` reads), aligns the extract to the model's
 * features, writes one row per extract row — kept columns, the prediction, class probabilities, notes —
 * and prints what the model saw differently from training: absent columns, unseen categories, unreadable
 * values, numbers outside the training range (when the model file records ranges). Writes are atomic and
 * never replace the model or the extract. Exit code 0 when scored (1 with `--strict` when any row has a
 * note), 2 with a message on bad input.
 */
import { extname } from 'node:path';
import { errors } from '../errors.js';
import { loadModel } from '../learn/model-file.js';
import { readExtract } from '../table/read-extract.js';
import { rawTable } from '../table/raw-table.js';
import { refuseOverwrite, writeFileAtomic } from './atomic-file.js';
import { parseArgs } from './cli-args.js';
import { scoreColumns, toCsvText, toJsonText } from './score-records.js';
import { scoreTable, type ScoredTable } from './score-table.js';

const USAGE = 'coppice score <model.json> <extract> --out <file.csv|file.json> [--keep col,...] [--report <file.json>] [--strict]';

/**
 * Human summary of a scoring run (one line per kind of issue).
 * @example
 * describeScoring(scoreTable(model, rows), 'scores.csv')[0]; // 'Scored 3 rows → scores.csv'
 */
export function describeScoring(s: ScoredTable, outPath: string): string[] {
  const a = s.align;
  const lines = [`Scored ${a.nRows} row${a.nRows === 1 ? '' : 's'} → ${outPath}`];
  if (a.missingColumns.length) lines.push(`Absent columns (missing in every row): ${a.missingColumns.map((m) => m.column).join(', ')}`);
  for (const u of a.unseen) lines.push(`Unseen categories in ${u.column}: ${u.rows} row${u.rows === 1 ? '' : 's'} (${u.examples.join(', ')}${u.distinct > u.examples.length ? ', ...' : ''}); scored as missing`);
  for (const t of a.typeChanges) lines.push(`Column ${t.column} now holds ${t.found} (model expects ${t.expected}): ${t.rows} rows scored as missing`);
  for (const v of a.invalid) lines.push(`Unreadable values in ${v.column}: ${v.rows} rows (${v.examples.join(', ')}); scored as missing`);
  if (s.ranges === null) lines.push('Training ranges: not recorded in this model file, so out-of-range values are not checked');
  else for (const r of s.ranges) lines.push(`Outside the training range of ${r.column} [${r.min}, ${r.max}]: ${r.below} below, ${r.above} above`);
  if (a.extraColumns.length) lines.push(`Columns not used by the model: ${a.extraColumns.join(', ')}`);
  lines.push(`Rows with a note: ${s.rowsWithNotes}`);
  return lines;
}

/**
 * Run `coppice score` with the arguments after the command name; resolves to the exit code.
 * @example
 * await main(['model.json', 'march.csv', '--out', 'scores.csv']); // 0
 */
export async function main(args: string[]): Promise<number> {
  const parsed = parseArgs('score', args, ['out', 'keep', 'report'], ['strict']);
  if (parsed.positional.length !== 2) throw errors.badArguments('score', `expected a model file and an extract; usage: ${USAGE}`);
  const [modelPath, extractPath] = parsed.positional;
  const out = parsed.options.get('out');
  if (!out) throw errors.badArguments('score', `--out is required; usage: ${USAGE}`);
  const ext = extname(out).toLowerCase();
  if (ext !== '.csv' && ext !== '.json') throw errors.badArguments('score', `--out ${JSON.stringify(out)} should end in .csv or .json`);
  const reportPath = parsed.options.get('report');
  await refuseOverwrite(out, { extract: extractPath, model: modelPath });
  if (reportPath) await refuseOverwrite(reportPath, { extract: extractPath, model: modelPath, 'scores file': out });

  const model = await loadModel(modelPath);
  const table = await readExtract(extractPath);
  const scored = scoreTable(model, table);
  const raw = rawTable(table);
  const keep = (parsed.options.get('keep') ?? '').split(',').map((k) => k.trim()).filter((k) => k !== '').map((k): [string, ArrayLike<unknown>] => {
    if (!raw.names.includes(k)) throw errors.unknownColumn(k, JSON.stringify(extractPath));
    return [k, raw.values(k)];
  });
  const columns = scoreColumns(model, scored.predictions, scored.notes, keep);
  await writeFileAtomic(out, ext === '.csv' ? toCsvText(columns) : toJsonText(columns));
  const lines = describeScoring(scored, out);
  if (reportPath) {
    const report = { model: modelPath, extract: extractPath, out, align: scored.align, ranges: scored.ranges, rowsWithNotes: scored.rowsWithNotes };
    await writeFileAtomic(reportPath, `${JSON.stringify(report, null, 2)}\n`);
  }
  process.stdout.write(`${lines.join('\n')}\n`);
  return parsed.flags.has('strict') && scored.rowsWithNotes > 0 ? 1 : 0;
}
