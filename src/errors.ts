/**
 * Every message coppice throws is built here, so wording stays short and consistent:
 * it names the column, option or value at fault and says what was expected.
 */

/** The one error type coppice throws for bad input. `code` is stable; the message is for people. */
export class CoppiceError extends Error {
  readonly code: string;
  constructor(code: string, message: string) {
    super(message);
    this.name = 'CoppiceError';
    this.code = code;
  }
}

/** Quote a value for a message: strings in quotes, long values cut. */
export function show(value: unknown): string {
  let text: string;
  if (typeof value === 'string') text = JSON.stringify(value);
  else if (typeof value === 'number' || typeof value === 'bigint' || typeof value === 'boolean') text = String(value);
  else if (value === undefined) text = 'undefined';
  else {
    try {
      text = JSON.stringify(value) ?? String(value);
    } catch {
      text = String(value);
    }
  }
  return text.length > 80 ? `${text.slice(0, 77)}...` : text;
}

export const errors = {
  unknownColumn: (name: string, where = 'table') =>
    new CoppiceError('unknown-column', `Unknown column ${show(name)} in ${where}.`),
  missingColumn: (name: string, where: string) =>
    new CoppiceError('missing-column', `Column ${show(name)} is missing from ${where}.`),
  badOption: (option: string, value: unknown, expected: string) =>
    new CoppiceError('bad-option', `Option ${option} = ${show(value)} is invalid: expected ${expected}.`),
  unknownOption: (option: string, known: readonly string[]) =>
    new CoppiceError('unknown-option', `Unknown option ${show(option)}; known options: ${known.join(', ')}.`),
  emptyData: (what: string) => new CoppiceError('empty-data', `No rows to ${what}: the table is empty.`),
  badValue: (column: string, row: number, value: unknown, expected: string) =>
    new CoppiceError('bad-value', `Column ${show(column)}, row ${row}: value ${show(value)} is invalid: expected ${expected}.`),
  badTarget: (column: string, reason: string) =>
    new CoppiceError('bad-target', `Target column ${show(column)}: ${reason}.`),
  badFile: (path: string, reason: string) => new CoppiceError('bad-file', `Cannot read ${show(path)}: ${reason}.`),
  badModel: (reason: string) => new CoppiceError('bad-model', `Model file rejected: ${reason}.`),
  schemaMismatch: (reason: string) => new CoppiceError('schema-mismatch', `Table does not match the model: ${reason}.`),
  notSupported: (what: string) => new CoppiceError('not-supported', `${what} is not supported.`),

  // --- charts (src/charts) ---
  /** A chart input value that cannot be drawn (NaN, Infinity, wrong type). */
  chartInput: (chart: string, field: string, row: number, value: unknown, expected: string) =>
    new CoppiceError('chart-input', `${chart}: ${field} of row ${row} is ${show(value)}; expected ${expected}.`),
  /** Parallel chart inputs of different lengths. */
  chartLengths: (chart: string, what: string, expected: number, got: number) =>
    new CoppiceError('chart-lengths', `${chart}: ${what} has ${got} values; expected ${expected}.`),
  /** vega or vega-lite reported a problem while rendering a chart. */
  chartRender: (messages: readonly string[]) =>
    new CoppiceError('chart-render', `Chart rendering reported: ${messages.slice(0, 3).join(' | ')}.`),
  // --- end charts ---

  // --- assess (splits, metrics, cross-validation, search): task C ---
  lengthMismatch: (what: string, expected: number, got: number) =>
    new CoppiceError('length-mismatch', `${what} has length ${got}; expected ${expected}.`),
  badProbability: (row: number, value: number) =>
    new CoppiceError('bad-probability', `Probability at row ${row} is ${show(value)}: expected a number in [0, 1].`),
  oneClassOnly: (metric: string, present: string) =>
    new CoppiceError('one-class-only', `${metric} needs both positive and negative rows; only ${present} present.`),
  unknownMetric: (name: string, known: readonly string[]) =>
    new CoppiceError('unknown-metric', `Unknown metric ${show(name)}; known metrics: ${known.join(', ')}.`),
  metricTask: (name: string, task: string) =>
    new CoppiceError('metric-task', `Metric ${show(name)} does not apply to ${task}.`),
  rowLeak: (fold: number, stage: string, count: number) =>
    new CoppiceError('row-leak', `Fold ${fold}: ${count} test row(s) also appear in the ${stage} rows.`),
  // --- ensembles (task G: src/learn/ensemble) ---
  badLoss: (loss: string, target: string) =>
    new CoppiceError('bad-loss', `Loss ${show(loss)} does not fit a ${target} target.`),
  oneClass: (column: string, label: string) =>
    new CoppiceError('one-class', `Target column ${show(column)} has one class (${show(label)}): nothing to separate.`),
  badWeights: (reason: string) => new CoppiceError('bad-weights', `Sample weights rejected: ${reason}.`),
  badWatchSet: (reason: string) => new CoppiceError('bad-watch-set', `Watched set rejected: ${reason}.`),
  // --- end ensembles ---
  // --- reruns: extracts, decisions, headless runs, run records (task H) ---
  badExtractName: (name: unknown) =>
    new CoppiceError('bad-extract-name', `Extract name ${show(name)} is invalid: expected a name like shipments_2025.`),
  unreadableExtract: (name: string, source: string, reason: string) =>
    new CoppiceError('unreadable-extract', `Extract ${show(name)} from ${show(source)} cannot be read: ${reason}.`),
  unknownExtract: (name: string, declared: readonly string[]) =>
    new CoppiceError('unknown-extract', `The notebook declares no extract ${show(name)}; it declares: ${declared.length ? declared.join(', ') : '(none)'}.`),
  badExtractBinding: (text: string) =>
    new CoppiceError('bad-extract-binding', `--extract ${show(text)} is invalid: expected name=path-or-query.`),
  badCheck: (check: unknown, reason: string) =>
    new CoppiceError('bad-check', `Decision check ${show(check)} is invalid: ${reason}.`),
  badDecision: (field: string, reason: string) =>
    new CoppiceError('bad-decision', `Decision ${field} is invalid: ${reason}.`),
  badNotebook: (path: string, reason: string) =>
    new CoppiceError('bad-notebook', `Notebook ${show(path)} cannot be run: ${reason}.`),
  badRunRecord: (path: string, reason: string) =>
    new CoppiceError('bad-run-record', `Run record ${show(path)} is invalid: ${reason}.`),
  badArguments: (command: string, reason: string) =>
    new CoppiceError('bad-arguments', `coppice ${command}: ${reason}.`),

  // --- table (extracts, frames, datasets, alignment): task A ---
  fileNotFound: (path: string) => new CoppiceError('file-not-found', `File not found: ${show(path)}.`),
  raggedRow: (path: string, line: number, expected: number, actual: number) =>
    new CoppiceError('ragged-row', `${show(path)}, line ${line}: ${actual} field(s), expected ${expected} as in the header.`),
  unclosedQuote: (path: string, line: number) =>
    new CoppiceError('unclosed-quote', `${show(path)}, line ${line}: a quoted field is never closed.`),
  strayQuote: (path: string, line: number) =>
    new CoppiceError('stray-quote', `${show(path)}, line ${line}: unexpected text after a closing quote.`),
  badHeader: (path: string, reason: string) => new CoppiceError('bad-header', `${show(path)}: header ${reason}.`),
  unknownFormat: (path: string, ext: string) =>
    new CoppiceError('unknown-format', `Cannot tell the format of ${show(path)} (extension ${show(ext)}); set option format to csv, tsv, json, arrow or parquet.`),
  readerMissing: (what: string) =>
    new CoppiceError('reader-missing', `Reading ${what} needs the DuckDB reader (src/table/duckdb.ts), which is not available.`),
  columnClash: (name: string, source: string) =>
    new CoppiceError('column-clash', `Column ${show(name)} made from date column ${show(source)} clashes with an existing column.`),
  optionConflict: (column: string, a: string, b: string) =>
    new CoppiceError('option-conflict', `Column ${show(column)} is listed in both ${a} and ${b}.`),
  badRow: (row: number, value: unknown) =>
    new CoppiceError('bad-row', `Row ${row} is ${show(value)}: expected an object of column values.`),
  // --- notebook: kernel, cell magics, display, progress (task F) ---
  badMagic: (line: number, column: number, reason: string, excerpt: string) =>
    new CoppiceError('bad-magic', `Magic at line ${line}, column ${column}: ${reason}.\n${excerpt}`),
  badConnectionFile: (path: string, reason: string) =>
    new CoppiceError('bad-connection-file', `Kernel connection file ${show(path)} is invalid: ${reason}.`),
  // --- end notebook ---
  // --- speed: binning, kernels, workers, DuckDB (task E) ---
  binnedMismatch: (reason: string) =>
    new CoppiceError('binned-mismatch', `Binned frame does not match the frame: ${reason}.`),
  workerFailed: (job: string, reason: string) =>
    new CoppiceError('worker-failed', `Worker job ${show(job)} failed: ${reason}.`),
  badQuery: (source: string, reason: string) =>
    new CoppiceError('bad-query', `DuckDB could not read ${show(source)}: ${reason}.`),
  // --- end speed ---
  // --- explain: importance, dependence, contributions, scoring, ONNX export (task I) ---
  /** No values to build a partial dependence grid from. */
  noGrid: (column: string) =>
    new CoppiceError('no-grid', `Feature ${show(column)} has no values to build a grid from (all missing?).`),
  /** A model cannot be written as ONNX-ML tree ensembles. */
  onnxExport: (reason: string) => new CoppiceError('onnx-export', `Cannot export to ONNX: ${reason}.`),
  /** An output path that would overwrite an input. */
  wouldOverwrite: (path: string, what: string) =>
    new CoppiceError('would-overwrite', `Refusing to write ${show(path)}: it is the ${what}.`),
  // --- end explain ---
};
