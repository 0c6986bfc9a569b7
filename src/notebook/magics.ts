/**
 * The built-in cell magics, in one table so names can be adjusted in one place.
 *
 * | magic      | what it does                                                    |
 * |------------|-----------------------------------------------------------------|
 * | `%extract` | declare a named input a rerun can rebind (`declareExtract`)     |
 * | `%glance`  | one row per column of a table                                   |
 * | `%%fit`    | fit a learner from a settings body, with progress and a summary |
 * | `%%lineup` | score several models on the same rows: table + chart            |
 * | `%%decide` | record a modelling decision with evidence and checks            |
 */
import type { MagicDefinition } from './magic-compile.js';
import { decideMagic } from './magic-decide.js';
import { extractMagic } from './magic-extract.js';
import { fitMagic } from './magic-fit.js';
import { glanceMagic } from './magic-glance.js';
import { lineupMagic } from './magic-lineup.js';

export const builtinMagics: readonly MagicDefinition[] = [extractMagic, glanceMagic, fitMagic, lineupMagic, decideMagic];
