/**
 * `%glance <table>`: one row per column — kind, missing, distinct, range, mean, most common values.
 * Compiles to `await showValue(<table>, { as: "glance" })`.
 */
import type { MagicDefinition } from './magic-compile.js';
import { RUNTIME } from './magic-compile.js';
import { magicError } from './magic-parse.js';

export const glanceMagic: MagicDefinition = {
  name: 'glance',
  usage: '%glance <table expression>',
  form: 'line',
  compile(call) {
    if (call.args === '') magicError(call.argsAt, call.text, 1, 'missing the table to glance at, e.g. %glance penguins');
    return [`await ${RUNTIME}.showValue((${call.args}), { as: "glance" });`];
  },
};
