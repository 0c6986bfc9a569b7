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
};
