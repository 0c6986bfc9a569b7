/**
 * Schema changes between two bindings of an extract: columns added or removed, a column whose kind changed
 * (e.g. numbers became text), and categories that appeared or disappeared.
 */
import type { BoundExtract } from './record-state.js';

export type SchemaChangeKind = 'added' | 'removed' | 'kind' | 'new-categories' | 'lost-categories';

export interface SchemaChange {
  readonly column: string;
  readonly change: SchemaChangeKind;
  /** Kind before (removed, kind). */
  readonly before?: string;
  /** Kind after (added, kind). */
  readonly after?: string;
  /** Categories that appeared or disappeared (new-categories, lost-categories), at most 20 listed. */
  readonly categories?: readonly string[];
  /** How many categories appeared or disappeared in all. */
  readonly count?: number;
  /** Share of current rows in the new categories (new-categories). */
  readonly share?: number;
}

type Schemaish = Pick<BoundExtract, 'columns' | 'profiles'>;

const LIST_LIMIT = 20;

/**
 * List the schema changes from `baseline` to `current`, in the current column order (removed columns last).
 * @example
 * diffSchemas(previous.extracts[0], latest.extracts[0]);
 * // [{ column: 'service', change: 'new-categories', categories: ['drone'], count: 1, share: 0.04 }]
 */
export function diffSchemas(baseline: Schemaish, current: Schemaish): SchemaChange[] {
  const before = new Map(baseline.columns.map((c) => [c.name, c.kind]));
  const after = new Map(current.columns.map((c) => [c.name, c.kind]));
  const out: SchemaChange[] = [];
  for (const c of current.columns) {
    const was = before.get(c.name);
    if (was === undefined) { out.push({ column: c.name, change: 'added', after: c.kind }); continue; }
    if (was !== c.kind) { out.push({ column: c.name, change: 'kind', before: was, after: c.kind }); continue; }
    const bp = baseline.profiles[c.name], cp = current.profiles[c.name];
    if (bp?.kind !== 'categorical' || cp?.kind !== 'categorical') continue;
    const added = Object.keys(cp.counts).filter((k) => !(k in bp.counts));
    const lost = Object.keys(bp.counts).filter((k) => !(k in cp.counts));
    if (added.length) {
      const rows = added.reduce((s, k) => s + cp.counts[k], 0);
      out.push({ column: c.name, change: 'new-categories', categories: added.slice(0, LIST_LIMIT), count: added.length, share: cp.rows ? rows / cp.rows : 0 });
    }
    if (lost.length) out.push({ column: c.name, change: 'lost-categories', categories: lost.slice(0, LIST_LIMIT), count: lost.length });
  }
  for (const c of baseline.columns) if (!after.has(c.name)) out.push({ column: c.name, change: 'removed', before: c.kind });
  return out;
}

/**
 * One line describing a schema change.
 * @example
 * describeSchemaChange({ column: 'x', change: 'added', after: 'numeric' }); // 'new column x (numeric)'
 */
export function describeSchemaChange(c: SchemaChange): string {
  const list = (c.categories ?? []).map((k) => JSON.stringify(k)).join(', ');
  const more = (c.count ?? 0) > (c.categories?.length ?? 0) ? `, … ${c.count} in all` : '';
  switch (c.change) {
    case 'added': return `new column ${c.column} (${c.after})`;
    case 'removed': return `column ${c.column} is gone (was ${c.before})`;
    case 'kind': return `column ${c.column} changed from ${c.before} to ${c.after}`;
    case 'new-categories': return `column ${c.column} has new categories ${list}${more} (${((c.share ?? 0) * 100).toFixed(1)}% of rows)`;
    default: return `column ${c.column} lost categories ${list}${more}`;
  }
}
