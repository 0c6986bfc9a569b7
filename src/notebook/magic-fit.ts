/**
 * `%%fit <name> <learner>` with a settings body: fit a learner, bind the model to `name`, show progress
 * while it runs and a model summary at the end.
 *
 *     %%fit firstTree tree
 *     data: train
 *     target: species
 *     depth: 3
 *
 * Compiles (line for line) to
 *     const firstTree = await watchFit("firstTree", "tree", (d, o) => fitTree(d, o), {
 *       data: (train),
 *       target: "species",
 *       depthLimit: 3,
 *     });
 * Learner names, functions and settings come from `learnerTable`; a setting may also be written with its
 * option's API name (`depthLimit: 3`). A tree with a pruning setting calls `fitPrunedTree`.
 */
import type { MagicDefinition } from './magic-compile.js';
import { RUNTIME, isIdentifier, quote } from './magic-compile.js';
import { dataSettings, findSetting, learnerTable } from './magic-learners.js';
import { magicError } from './magic-parse.js';
import { parseSettings, type Setting } from './magic-settings.js';
import { valueSource } from './magic-values.js';

export const fitMagic: MagicDefinition = {
  name: 'fit',
  usage: '%%fit <name> <learner> with "setting: value" lines (data, target, ...)',
  form: 'cell',
  compile(call) {
    const words = call.args.split(/\s+/).filter((w) => w !== '');
    const learners = Object.keys(learnerTable).join(', ');
    if (words.length === 0) magicError(call.argsAt, call.text, 1, `missing the model name and learner, e.g. %%fit firstTree tree`);
    const [name, learner] = words;
    if (!isIdentifier(name)) magicError(call.argsAt, call.text, name.length, `model name ${JSON.stringify(name)} is not a valid variable name`);
    const learnerColumn = call.argsAt.column + call.args.indexOf(learner ?? '', name.length);
    if (!learner) magicError({ line: call.argsAt.line, column: call.argsAt.column + name.length + 1 }, call.text, 1, `missing the learner after the name; one of ${learners}`);
    const rule = learnerTable[learner];
    if (!rule) magicError({ line: call.argsAt.line, column: learnerColumn }, call.text, learner.length, `unknown learner ${JSON.stringify(learner)}; one of ${learners}`);
    if (words.length > 2) {
      const extra = words[2];
      magicError({ line: call.argsAt.line, column: call.argsAt.column + call.args.indexOf(extra, learnerColumn - call.argsAt.column + learner.length) }, call.text, extra.length, 'settings go on their own lines below, as "name: value"');
    }
    const settings = parseSettings(call);
    const known = { ...dataSettings, ...rule.settings };
    const given = new Map<string, Setting>();
    const lines: [number, string][] = [];
    for (const s of settings) {
      const r = findSetting(known, s.key);
      if (!r) magicError(s.keyAt, s.line, s.key.length, `unknown setting ${JSON.stringify(s.key)} for ${learner}; known: ${Object.keys(known).join(', ')}`);
      const twice = given.get(r.option);
      if (twice) magicError(s.keyAt, s.line, s.key.length, `${s.key} sets ${r.option} again (first at line ${twice.keyAt.line})`);
      given.set(r.option, s);
      lines.push([s.first - call.lineIndex, `  ${r.option}: ${valueSource(s, r.value)},`]);
    }
    const fn = rule.variant && rule.variant.when.some((o) => given.has(o)) ? rule.variant.fn : rule.fn;
    const out = [`const ${name} = await ${RUNTIME}.watchFit(${quote(name)}, ${quote(learner)}, (d, o) => ${RUNTIME}.${fn}(d, o), {`, ...call.body.map(() => '')];
    for (const [at, text] of lines) out[at] = text;
    for (const required of ['data', 'target']) {
      if (!given.has(required)) {
        magicError(call.nameAt, call.text, call.name.length, `%%fit needs a "${required}:" line`);
      }
    }
    out[out.length - 1] += '});';
    return out;
  },
};
