/**
 * Cautions for models whose use affects people (credit, insurance, hiring, pricing, ...): when the notebook's
 * metadata or a decision says so, the report states them once, plainly.
 */
import type { RunRecord } from './record-file.js';
import { escapeHtml } from './report-escape.js';

/** The uses affecting people named by a run (metadata and decisions), without repeats. */
export function usesAffectingPeople(record: Pick<RunRecord, 'affectsPeople' | 'decisions'>): string[] {
  const all = [...record.affectsPeople, ...record.decisions.flatMap((d) => d.affects)];
  return [...new Set(all.map((u) => u.trim()).filter((u) => u !== ''))];
}

/** The cautions as plain sentences. */
export const CAUTIONS: readonly string[] = [
  'Check how the model performs for each group of people it affects, not only overall: a good average can hide a group it serves badly.',
  'Watch for features that stand in for protected attributes (postcode, age of account, device, first name): a model can discriminate without ever seeing the attribute itself.',
  'Local law and regulators decide what is allowed here; where they set rules on automated decisions, explanations or data use, they take precedence over anything in this report.',
];

/**
 * The cautions block.
 * @example
 * cautionsHtml(['credit']);
 */
export function cautionsHtml(uses: readonly string[]): string {
  return `<aside class="cautions"><h2>Before using this model on people</h2>`
    + `<p>This notebook marks its use as affecting people (${escapeHtml(uses.join(', '))}).</p>`
    + `<ul>${CAUTIONS.map((c) => `<li>${escapeHtml(c)}</li>`).join('')}</ul></aside>`;
}
