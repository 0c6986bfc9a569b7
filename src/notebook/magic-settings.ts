/**
 * The settings body of a cell magic: one `key: value` per line. Blank lines and lines starting with `#`
 * are skipped; an indented line continues the value above it (for longer text such as reasoning).
 */
import type { MagicCall, Place } from './magic-parse.js';
import { magicError } from './magic-parse.js';

export interface Setting {
  readonly key: string;
  readonly keyAt: Place;
  /** The value, trimmed; continuation lines are joined with a newline. */
  readonly value: string;
  readonly valueAt: Place;
  /** The raw text of the setting's first line (for caret messages). */
  readonly line: string;
  /** 0-based cell line indices of the setting's first and last line. */
  readonly first: number;
  readonly last: number;
}

const settingLine = /^([A-Za-z][\w-]*)\s*:(.*)$/;

/**
 * Parse the body of cell magic `call` into settings, in order. Keys in `repeatable` may appear more than once.
 * @example
 * parseSettings(splitCell('%%fit m\nlearner: tree\ndepth: 3')[0].call);
 * // [{ key: 'learner', value: 'tree', ... }, { key: 'depth', value: '3', ... }]
 */
export function parseSettings(call: MagicCall, repeatable: ReadonlySet<string> = new Set()): Setting[] {
  const out: Setting[] = [];
  let open: { s: Setting; parts: string[] } | null = null;
  const close = () => {
    if (open) out.push({ ...open.s, value: open.parts.join('\n').trim() });
    open = null;
  };
  call.body.forEach((raw, k) => {
    const lineIndex = call.lineIndex + 1 + k;
    const lineNo = lineIndex + 1;
    const trimmed = raw.trim();
    if (trimmed === '' || trimmed.startsWith('#')) return;
    if (/^\s/.test(raw)) {
      if (!open) {
        magicError({ line: lineNo, column: raw.search(/\S/) + 1 }, raw, trimmed.length, 'an indented line must continue a setting above it');
      }
      open.parts.push(trimmed);
      open.s = { ...open.s, last: lineIndex };
      return;
    }
    const m = settingLine.exec(raw);
    if (!m) {
      const word = /^\S+/.exec(raw)?.[0] ?? raw;
      magicError({ line: lineNo, column: 1 }, raw, word.length, `expected "name: value" in %%${call.name}, found ${JSON.stringify(word)}`);
    }
    close();
    const key = m[1];
    const dup = repeatable.has(key) ? undefined : out.find((s) => s.key === key);
    if (dup) magicError({ line: lineNo, column: 1 }, raw, key.length, `setting ${key} is given twice (first at line ${dup.keyAt.line})`);
    const afterColon = raw.indexOf(':') + 1;
    const rest = raw.slice(afterColon);
    const valueColumn = afterColon + (rest.length - rest.trimStart().length) + 1;
    const s: Setting = {
      key,
      keyAt: { line: lineNo, column: 1 },
      value: '',
      valueAt: { line: lineNo, column: valueColumn },
      line: raw,
      first: lineIndex,
      last: lineIndex,
    };
    open = { s, parts: [m[2]] };
  });
  close();
  return out;
}
