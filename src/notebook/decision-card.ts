/**
 * The decision card: how a recorded decision is shown in a notebook and in the report — an HTML card (every value
 * escaped), a plain-text form, and the record itself as JSON under coppice's own mime type.
 */
import type { CheckResult, DecisionRecord } from './decision-types.js';
import { escapeHtml } from './report-escape.js';

/** Mime type of a decision record in a display bundle. */
export const DECISION_MIME = 'application/vnd.coppice.decision+json';

function observedText(c: CheckResult): string {
  if (c.observed === null) return c.detail;
  return typeof c.observed === 'number' && c.kind === 'rank' ? `rank ${c.observed}` : c.detail;
}

/**
 * Plain-text form of a decision.
 * @example
 * decisionText(record); // 'Decision: Ship with the boosted model\n  Why: ...'
 */
export function decisionText(d: DecisionRecord): string {
  const lines = [`Decision: ${d.title}`];
  if (d.reasoning) lines.push(`  Why: ${d.reasoning.replace(/\s*\n\s*/g, ' ')}`);
  if (d.evidence.length) {
    const ev = d.evidence.map((e) => (e.found ? `${e.name} (${e.kind}${e.value !== null ? ` ${Number(e.value.toPrecision(4))}` : ''})` : `${e.name} (not shown)`));
    lines.push(`  Evidence: ${ev.join(', ')}`);
  }
  if (d.checks.length) {
    const held = d.checks.filter((c) => c.holds).length;
    lines.push(`  Checks: ${held} of ${d.checks.length} hold`);
    for (const c of d.checks) lines.push(`    [${c.holds ? 'holds' : 'FAILS'}] ${c.label}  (${observedText(c)})`);
  }
  return lines.join('\n');
}

const STYLE = {
  card: 'border:1px solid #c9c3b8;border-left:6px solid #3d6b4f;border-radius:6px;padding:10px 14px;margin:6px 0;font-family:system-ui,sans-serif;font-size:13px;max-width:760px;background:#fbfaf7;color:#22201c',
  failing: 'border-left-color:#b3452c',
  title: 'font-weight:600;font-size:15px;margin:0 0 6px 0',
  label: 'text-transform:uppercase;letter-spacing:.04em;font-size:11px;color:#6b655b;margin:8px 0 2px 0',
  ok: 'color:#2f6b45;font-weight:600',
  bad: 'color:#b3452c;font-weight:600',
};

function checkRow(c: CheckResult): string {
  const mark = c.holds ? `<span style="${STYLE.ok}">holds</span>` : `<span style="${STYLE.bad}">fails</span>`;
  return `<tr><td style="padding:2px 10px 2px 0">${mark}</td><td style="padding:2px 10px 2px 0"><code>${escapeHtml(c.label)}</code></td>`
    + `<td style="padding:2px 0;color:#4a463f">${escapeHtml(observedText(c))}</td></tr>`;
}

/**
 * HTML card for a decision (self-contained inline styles; every value escaped).
 * @example
 * decisionHtml(record); // '<div class="coppice-decision" ...'
 */
export function decisionHtml(d: DecisionRecord): string {
  const failing = d.checks.some((c) => !c.holds);
  const parts = [`<div class="coppice-decision" style="${STYLE.card}${failing ? `;${STYLE.failing}` : ''}">`];
  parts.push(`<div style="${STYLE.title}">Decision: ${escapeHtml(d.title)}</div>`);
  if (d.reasoning) {
    parts.push(`<div style="${STYLE.label}">Why</div>`);
    for (const para of d.reasoning.split(/\n\s*\n/)) parts.push(`<p style="margin:2px 0">${escapeHtml(para.trim())}</p>`);
  }
  if (d.evidence.length) {
    parts.push(`<div style="${STYLE.label}">Evidence</div><ul style="margin:2px 0;padding-left:18px">`);
    for (const e of d.evidence) {
      const note = e.found ? `${escapeHtml(e.kind)}${e.value !== null ? ` = ${escapeHtml(Number(e.value.toPrecision(4)))}` : ''}` : '<em>not shown in this run</em>';
      parts.push(`<li>${escapeHtml(e.name)} <span style="color:#6b655b">(${note})</span></li>`);
    }
    parts.push('</ul>');
  }
  if (d.checks.length) {
    const held = d.checks.filter((c) => c.holds).length;
    parts.push(`<div style="${STYLE.label}">Checks — ${held} of ${d.checks.length} hold</div><table style="border-collapse:collapse">`);
    for (const c of d.checks) parts.push(checkRow(c));
    parts.push('</table>');
  }
  if (d.affects.length) parts.push(`<div style="${STYLE.label}">Affects people: ${escapeHtml(d.affects.join(', '))}</div>`);
  parts.push('</div>');
  return parts.join('');
}

/**
 * The display bundle for a decision: HTML card, plain text and the record as JSON.
 * @example
 * emitDisplay({ data: decisionBundle(record), metadata: {}, transient: {} });
 */
export function decisionBundle(d: DecisionRecord): Record<string, unknown> {
  return { 'text/html': decisionHtml(d), 'text/plain': decisionText(d), [DECISION_MIME]: JSON.parse(JSON.stringify(d)) };
}
