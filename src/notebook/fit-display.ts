/**
 * Fitting from a notebook cell with progress shown in place and the model summary at the end; the fit
 * magic compiles to `watchFit`.
 */
import type { ModelHeader } from '../learn/model.js';
import type { Dataset } from '../table/frame.js';
import type { TableInput } from '../table/raw-table.js';
import { toDataset, type ToDatasetOptions } from '../table/to-dataset.js';
import { modelBundle } from './model-bundle.js';
import type { Progress } from './progress.js';
import { startProgress } from './progress.js';

/** The data part of a fit request: a table plus how to read it, or a ready Dataset. */
export interface FitData {
  /** An arquero table, row objects, Frame, or a Dataset. */
  readonly data: unknown;
  /** Target column (needed unless `data` is a Dataset). */
  readonly target?: string;
  readonly features?: readonly string[];
  readonly exclude?: readonly string[];
  readonly weight?: string;
  readonly missingTarget?: 'error' | 'drop';
}

const dataKeys = ['data', 'target', 'features', 'exclude', 'weight', 'missingTarget'] as const;

function isDataset(x: unknown): x is Dataset {
  const d = x as Partial<Dataset> | null;
  return d != null && typeof d === 'object' && d.features != null && d.target != null && 'weights' in d;
}

/**
 * Fit with `fit`, showing progress while it runs and the model summary (named `name`) when done.
 * `request` holds the data settings (`data`, `target`, `features`, `exclude`, `weight`, `missingTarget`);
 * every other key is passed to `fit` as a learner option. A `watch` table is read like the data.
 * @example
 * const forest = await watchFit('forest', 'forest', (d, o) => fitForest(d, o), { data: train, target: 'species', size: 200 });
 */
export async function watchFit<M extends ModelHeader>(
  name: string,
  learner: string,
  fit: (data: Dataset, options: Record<string, unknown>, progress: Progress) => M | Promise<M>,
  request: FitData & Record<string, unknown>,
): Promise<M> {
  const options: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(request)) if (!(dataKeys as readonly string[]).includes(k) && v !== undefined) options[k] = v;
  const progress = startProgress(`fitting ${name} (${learner})`, { unit: 'step' });
  try {
    let data: Dataset;
    if (isDataset(request.data)) data = request.data;
    else {
      const o: ToDatasetOptions = {
        target: request.target as string,
        ...(request.features ? { features: request.features } : {}),
        ...(request.exclude ? { exclude: request.exclude } : {}),
        ...(request.weight ? { weight: request.weight } : {}),
        ...(request.missingTarget ? { missingTarget: request.missingTarget } : {}),
      };
      data = toDataset(request.data as TableInput, o);
    }
    if (options.watch !== undefined && !isDataset(options.watch)) {
      options.watch = toDataset(options.watch as TableInput, { target: data.target.name, features: data.features.columns.map((c) => c.name) });
    }
    await new Promise((done) => setImmediate(done));
    const model = await fit(data, options, progress);
    progress.finish(modelBundle(model, name));
    return model;
  } catch (err) {
    progress.fail(err instanceof Error ? err.message : String(err));
    throw err;
  }
}
