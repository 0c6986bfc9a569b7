/**
 * The seeded packhouse crates of gallery.ts as a coppice `Dataset` (storage hours, bruise score, harvest week,
 * variety → grade or shelf life), so chart tests and the gallery can fit real models on them.
 */
import type { Dataset, Frame } from '../../src/table/frame.js';
import { packhouseCrates } from './gallery.js';

const VARIETIES = ['Elstar', 'Jonagold', 'Boskoop', 'Topaz', 'Santana'];

/** `n` seeded crates (rows `from`..`from + n` of the seeded sequence) with grade (classes) or shelf life (days) as target. */
export function crateDataset(n: number, target: 'grade' | 'shelf', seed = 2024, from = 0): Dataset {
  const crates = packhouseCrates(from + n, seed).slice(from);
  const numeric = (name: string, pick: (c: (typeof crates)[number]) => number) =>
    ({ name, kind: 'numeric' as const, values: Float64Array.from(crates, pick) });
  const columns = [
    numeric('storage_hours', (c) => c.storage),
    numeric('bruise_score', (c) => c.bruise),
    numeric('harvest_week', (c) => c.week),
    { name: 'variety', kind: 'categorical' as const, codes: Int32Array.from(crates, (c) => VARIETIES.indexOf(c.variety)), categories: VARIETIES },
  ];
  const features: Frame = {
    nRows: n,
    columns,
    schema: { columns: columns.map((c) => ({ name: c.name, kind: c.kind, ...('categories' in c ? { categories: c.categories } : {}) })), fingerprint: 'packhouse' },
  };
  return target === 'grade'
    ? { features, target: { kind: 'class', name: 'grade', codes: Int32Array.from(crates, (c) => c.grade), classes: ['grade A', 'grade B', 'rejected'] }, weights: null }
    : { features, target: { kind: 'number', name: 'shelf_life', values: Float64Array.from(crates, (c) => c.shelf) }, weights: null };
}
