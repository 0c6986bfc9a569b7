/**
 * Split a notebook cell into ordinary TypeScript lines and magic calls, following Jupyter's convention:
 * a line starting with `%name` is a line magic; a cell whose first non-blank line starts with `%%name`
 * is a cell magic whose body is the rest of the cell.
 *
 * A `%` counts as a magic only at the very start of a line and directly followed by a letter, so a
 * TypeScript remainder operator (`a % b`, `a\n  % b`) is left alone.
 */
import { errors } from '../errors.js';

/** A 1-based line and column in the cell, for messages. */
export interface Place {
  readonly line: number;
  readonly column: number;
}

export interface MagicCall {
  readonly name: string;
  /** True for `%%name` (cell magic), false for `%name` (line magic). */
  readonly cell: boolean;
  /** The text after the name on the magic's own line, trimmed. */
  readonly args: string;
  /** Where `args` starts (or where it would start when empty). */
  readonly argsAt: Place;
  /** Where the name starts (after the `%` signs). */
  readonly nameAt: Place;
  /** The magic's own line, as written. */
  readonly text: string;
  /** 0-based index of the magic's line in the cell. */
  readonly lineIndex: number;
  /** Cell magics: the lines after the magic line (raw, untrimmed). Line magics: empty. */
  readonly body: readonly string[];
}

export type CellPart =
  | { readonly kind: 'code'; readonly lineIndex: number; readonly text: string }
  | { readonly kind: 'magic'; readonly call: MagicCall };

const magicLine = /^(%%?)([A-Za-z][\w-]*)(.*)$/;

/**
 * Split `source` into code lines and magic calls, in order.
 * @example
 * splitCell('%extract claims data/claims.csv\nclaims.numRows()');
 * // [{ kind: 'magic', call: { name: 'extract', args: 'claims data/claims.csv', ... } },
 * //  { kind: 'code', lineIndex: 1, text: 'claims.numRows()' }]
 */
export function splitCell(source: string): CellPart[] {
  const lines = source.split(/\r?\n/);
  const parts: CellPart[] = [];
  const firstUsed = lines.findIndex((l) => l.trim() !== '');
  for (let i = 0; i < lines.length; i++) {
    const text = lines[i];
    const m = magicLine.exec(text);
    if (!m) {
      if (/^\s+%%?[A-Za-z]/.test(text) && i === firstUsed) {
        const col = text.search(/%/) + 1;
        throw errors.badMagic(i + 1, col, 'a magic must start at the beginning of its line', excerpt(text, col, 1));
      }
      parts.push({ kind: 'code', lineIndex: i, text });
      continue;
    }
    const [, signs, name, rest] = m;
    const cell = signs === '%%';
    if (cell && i !== firstUsed) {
      throw errors.badMagic(i + 1, 1, `cell magic %%${name} must be on the first line of the cell`, excerpt(text, 1, signs.length + name.length));
    }
    const lead = rest.length - rest.trimStart().length;
    const call: MagicCall = {
      name,
      cell,
      args: rest.trim(),
      nameAt: { line: i + 1, column: signs.length + 1 },
      argsAt: { line: i + 1, column: signs.length + name.length + lead + 1 },
      text,
      lineIndex: i,
      body: cell ? lines.slice(i + 1) : [],
    };
    parts.push({ kind: 'magic', call });
    if (cell) break;
  }
  return parts;
}

/**
 * The offending line with a caret under `length` characters from 1-based `column`.
 * @example
 * excerpt('depht: 4', 1, 5); // '  depht: 4\n  ^^^^^'
 */
export function excerpt(line: string, column: number, length: number): string {
  const shown = line.replace(/\t/g, ' ');
  return `  ${shown}\n  ${' '.repeat(Math.max(0, column - 1))}${'^'.repeat(Math.max(1, length))}`;
}

/** Throw a magic error at `place` underlining `length` characters of `line`. */
export function magicError(place: Place, line: string, length: number, reason: string): never {
  throw errors.badMagic(place.line, place.column, reason, excerpt(line, place.column, length));
}
