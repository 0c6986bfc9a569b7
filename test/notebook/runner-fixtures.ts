/** Small notebooks and extracts for runner tests (written into a temporary folder). */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export function notebookJson(cells: { type?: 'code' | 'markdown'; source: string }[], kernel = 'coppice'): string {
  return JSON.stringify({
    nbformat: 4, nbformat_minor: 5,
    metadata: { kernelspec: { name: kernel, display_name: 'TypeScript (coppice)', language: 'typescript' } },
    cells: cells.map((c) => (c.type === 'markdown'
      ? { cell_type: 'markdown', metadata: {}, source: c.source }
      : { cell_type: 'code', metadata: {}, execution_count: null, outputs: [], source: c.source })),
  }, null, 1);
}

/** A folder with `baseline.csv`, `refreshed.csv` and `produce.ipynb` (extract, a metric, a decision with a check). */
export function produceFolder(extraCells: { type?: 'code' | 'markdown'; source: string }[] = []): string {
  const dir = mkdtempSync(join(tmpdir(), 'coppice-runner-'));
  writeFileSync(join(dir, 'baseline.csv'), 'crop,temp,waste\ntomato,4,1.2\nlettuce,5,3.1\ntomato,3,0.9\nberry,6,2.5\n');
  writeFileSync(join(dir, 'refreshed.csv'), 'crop,temp,waste\ntomato,7,1.9\nlettuce,8,4.1\nraspberry,9,7.5\nberry,6,5.0\n');
  writeFileSync(join(dir, 'broken.csv'), 'crop,temp,waste\ntomato,4\n"unterminated,1,2\n');
  writeFileSync(join(dir, 'produce.ipynb'), notebookJson([
    { type: 'markdown', source: '# Produce waste\n\nA tiny check of the runner.' },
    { source: '%extract produce baseline.csv' },
    { source: "import { noteMetric, recordDecision } from 'coppice';\nconst w = produce.rollup({ w: 'mean(d.waste)' }).get('w', 0) as number;\nnoteMetric('mean waste', w, { higherIsBetter: false });\nvoid process.stdout.write(`rows ${produce.numRows()}\\n`);" },
    ...extraCells,
    { source: "recordDecision({ title: 'Waste stays low', evidence: ['mean waste'], checks: ['mean waste <= 3'] });" },
  ]));
  return dir;
}
