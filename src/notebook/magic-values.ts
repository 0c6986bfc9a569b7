/**
 * Turn a magic setting's text into TypeScript source for its value, with a caret error when the text
 * does not fit the expected kind.
 */
import { isIdentifier, quote } from './magic-compile.js';
import { magicError } from './magic-parse.js';
import type { Setting } from './magic-settings.js';
import type { MagicSettingKind } from './magic-learners.js';

function unquoted(text: string): string {
  const t = text.trim();
  if (/^"(?:[^"\\]|\\.)*"$/.test(t)) return JSON.parse(t) as string;
  if (/^'[^']*'$/.test(t)) return t.slice(1, -1);
  return t;
}

/**
 * TypeScript source for `setting`'s value read as `kind`.
 * @example
 * valueSource({ value: '3', ... }, 'int');         // '3'
 * valueSource({ value: 'a, b', ... }, 'words');    // '["a", "b"]'
 * valueSource({ value: 'a, b', ... }, 'names');    // '{ a: a, b: b }' (written out: tslab does not rewrite shorthand properties)
 */
export function valueSource(setting: Setting, kind: MagicSettingKind): string {
  const v = setting.value;
  const fail = (why: string): never => magicError(setting.valueAt, setting.line, Math.max(1, v.split('\n')[0].length), `${setting.key}: ${why}`);
  if (v === '') fail('missing a value');
  switch (kind) {
    case 'int':
      if (v === 'Infinity' || v === 'none') return 'Infinity';
      if (!/^-?\d+$/.test(v)) fail(`expected a whole number, found ${JSON.stringify(v)}`);
      return String(Number(v));
    case 'number': {
      const x = Number(v);
      if (v.trim() === '' || !Number.isFinite(x)) fail(`expected a number, found ${JSON.stringify(v)}`);
      return String(x);
    }
    case 'bool':
      if (/^(true|yes)$/i.test(v)) return 'true';
      if (/^(false|no)$/i.test(v)) return 'false';
      return fail(`expected true or false, found ${JSON.stringify(v)}`);
    case 'word':
      return quote(unquoted(v));
    case 'words':
      return `[${v.split(',').map((w) => unquoted(w)).filter((w) => w !== '').map(quote).join(', ')}]`;
    case 'names': {
      const names = v.split(',').map((n) => n.trim());
      if (names.every((n) => isIdentifier(n))) return `{ ${names.map((n) => `${n}: ${n}`).join(', ')} }`;
      return `(${v.replace(/\n/g, ' ')})`;
    }
    case 'expr':
      return `(${v.replace(/\n/g, " ")})`;
  }
}
