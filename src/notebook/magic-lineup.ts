/**
 * `%%lineup [title]` with a settings body: score several models on the same rows and show a metrics
 * table and chart.
 *
 *     %%lineup holdout lineup
 *     models: firstTree, forest
 *     data: test
 *     metrics: accuracy, logLoss
 *
 * Compiles to `void (await showLineup({ firstTree: firstTree, forest: forest }, (test), { metrics: [...], title: "holdout lineup" }))` (the rows are shown, not printed again).
 */
import type { MagicDefinition } from './magic-compile.js';
import { RUNTIME, isIdentifier, quote } from './magic-compile.js';
import { magicError } from './magic-parse.js';
import { parseSettings } from './magic-settings.js';
import { valueSource } from './magic-values.js';

const known = ['models', 'data', 'metrics'];

export const lineupMagic: MagicDefinition = {
  name: 'lineup',
  usage: '%%lineup [title] with lines models: a, b / data: <table> / metrics: m1, m2 (optional)',
  form: 'cell',
  compile(call) {
    const settings = parseSettings(call);
    const out = [`void (await ${RUNTIME}.showLineup(`, ...call.body.map(() => '')];
    const found = new Map(settings.map((s) => [s.key, s]));
    for (const s of settings) {
      if (!known.includes(s.key)) magicError(s.keyAt, s.line, s.key.length, `unknown setting ${JSON.stringify(s.key)}; known: ${known.join(', ')}`);
    }
    const models = found.get('models');
    const data = found.get('data');
    if (!models) magicError(call.nameAt, call.text, call.name.length, '%%lineup needs a "models:" line');
    if (!data) magicError(call.nameAt, call.text, call.name.length, '%%lineup needs a "data:" line');
    const names = models.value.split(',').map((n) => n.trim());
    let col = models.valueAt.column;
    for (const n of names) {
      const at = models.line.indexOf(n, col - 1);
      if (!isIdentifier(n)) magicError({ line: models.valueAt.line, column: at + 1 }, models.line, Math.max(1, n.length), `model ${JSON.stringify(n)} is not a variable name`);
      col = at + n.length + 1;
    }
    // Written out as `a: a`: tslab does not rewrite shorthand properties that name earlier cells' variables.
    out[models.first - call.lineIndex] = `  { ${names.map((n) => `${n}: ${n}`).join(', ')} },`;
    out[data.first - call.lineIndex] = `  ${valueSource(data, 'expr')},`;
    const metrics = found.get('metrics');
    const title = call.args === '' ? 'model lineup' : call.args;
    const opts = `{ title: ${quote(title)}${metrics ? `, metrics: ${valueSource(metrics, 'words')}` : ''} }`;
    out[out.length - 1] += `${opts}));`;
    return out;
  },
};
