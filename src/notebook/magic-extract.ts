/**
 * `%extract name source` / `%%extract name` + source body: declare a named input that a rerun can
 * rebind to a refreshed extract (`coppice run --extract name=...`).
 *
 * Compiles to `const name: ExtractTable = await declareExtract("name", "source")`; the source is a file path or a
 * SQL query, written bare or in double quotes. The cell form takes a multi-line query as its body.
 */
import type { MagicDefinition } from './magic-compile.js';
import { RUNTIME, isIdentifier, quote } from './magic-compile.js';
import type { MagicCall } from './magic-parse.js';
import { magicError } from './magic-parse.js';

/** Parse a bare or double-quoted source text. */
function readSource(call: MagicCall, text: string, column: number): string {
  if (!text.startsWith('"')) return text;
  try {
    const value: unknown = JSON.parse(text);
    if (typeof value === 'string') return value;
  } catch {
    // fall through to the message below
  }
  return magicError({ line: call.argsAt.line, column }, call.text, text.length, 'a quoted source must be one double-quoted string');
}

export const extractMagic: MagicDefinition = {
  name: 'extract',
  usage: '%extract <name> <path or query>',
  form: 'both',
  compile(call) {
    const line = call.text;
    const m = /^(\S+)\s*(.*)$/.exec(call.args);
    if (!m) magicError(call.argsAt, line, 1, 'missing the extract name, e.g. %extract claims data/claims.csv');
    const [, name, rest] = m;
    if (!isIdentifier(name)) magicError(call.argsAt, line, name.length, `extract name ${JSON.stringify(name)} is not a valid variable name`);
    const sourceColumn = call.argsAt.column + call.args.indexOf(rest, name.length);
    let source: string;
    if (call.cell) {
      if (rest !== '') magicError({ line: call.argsAt.line, column: sourceColumn }, line, rest.length, 'with %%extract the source goes in the cell body');
      source = call.body.map((l) => l.trimEnd()).join('\n').trim();
      if (source === '') magicError({ line: call.argsAt.line, column: call.argsAt.column + name.length }, line, 1, 'the cell body is empty: write the path or query there');
    } else {
      if (rest === '') magicError({ line: call.argsAt.line, column: call.argsAt.column + name.length }, line, 1, 'missing the source (a path or a query) after the name');
      source = readSource(call, rest, sourceColumn);
    }
    const head = `const ${name}: ${RUNTIME}.ExtractTable = await ${RUNTIME}.declareExtract(${quote(name)}, ${quote(source)});`;
    return [head, ...call.body.map(() => '')];
  },
};
