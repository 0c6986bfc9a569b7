/**
 * `%%decide <title>` with a body: record a modelling decision — why, the evidence shown for it, and
 * checks that must keep holding on every rerun.
 *
 *     %%decide Use the forest for species labels
 *     why: Best holdout accuracy; the single tree is close but less stable.
 *       A second line of reasoning continues indented.
 *     evidence: holdout lineup
 *     check: holdout lineup: forest accuracy >= 0.9
 *     check: bill_length_mm in top 3 of importance
 *     affects: none
 *
 * Compiles to a `recordDecision({ title, reasoning, evidence, checks, affects })` call; each check is
 * parsed before anything runs, so a malformed one is pointed at with a caret.
 */
import { parseCheck } from './decision-checks.js';
import type { MagicDefinition } from './magic-compile.js';
import { RUNTIME, quote } from './magic-compile.js';
import { magicError } from './magic-parse.js';
import type { Setting } from './magic-settings.js';
import { parseSettings } from './magic-settings.js';

const repeatable = new Set(['check', 'evidence']);
const known = ['why', 'evidence', 'check', 'affects'];

function list(s: Setting): string[] {
  return s.value.split(/[,\n]/).map((x) => x.trim()).filter((x) => x !== '');
}

export const decideMagic: MagicDefinition = {
  name: 'decide',
  usage: '%%decide <title> with lines why: / evidence: / check: (repeatable) / affects:',
  form: 'cell',
  compile(call) {
    if (call.args === '') magicError(call.argsAt, call.text, 1, 'missing the decision title after %%decide');
    const settings = parseSettings(call, repeatable);
    const out = [`void ${RUNTIME}.recordDecision({ title: ${quote(call.args)},`, ...call.body.map(() => '')];
    for (const s of settings) {
      const at = s.first - call.lineIndex;
      switch (s.key) {
        case 'why':
          out[at] = `  reasoning: ${quote(s.value)},`;
          break;
        case 'evidence':
          break;
        case 'affects':
          out[at] = `  affects: [${list(s).filter((x) => x !== 'none').map(quote).join(', ')}],`;
          break;
        case 'check':
          try {
            parseCheck(s.value);
          } catch (err) {
            magicError(s.valueAt, s.line, Math.max(1, s.value.split('\n')[0].length), err instanceof Error ? err.message.replace(/\.$/, '') : String(err));
          }
          break;
        default:
          magicError(s.keyAt, s.line, s.key.length, `unknown setting ${JSON.stringify(s.key)}; known: ${known.join(', ')}`);
      }
    }
    // Repeatable keys become one property, written on the line of their first occurrence.
    const evidence = settings.filter((s) => s.key === 'evidence').flatMap(list);
    const checks = settings.filter((s) => s.key === 'check').map((s) => s.value);
    let firstEvidence = true;
    let firstCheck = true;
    for (const s of settings) {
      const at = s.first - call.lineIndex;
      if (s.key === 'evidence') {
        out[at] = firstEvidence ? `  evidence: [${evidence.map(quote).join(', ')}],` : '';
        firstEvidence = false;
      } else if (s.key === 'check') {
        out[at] = firstCheck ? `  checks: [${checks.map(quote).join(', ')}],` : '';
        firstCheck = false;
      }
    }
    out[out.length - 1] += '});';
    return out;
  },
};
