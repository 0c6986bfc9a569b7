/**
 * Fitting from a notebook cell with progress shown in place and the model summary at the end; the fit
 * magic compiles to `watchFit`.
 */
import type { ModelHeader } from '../learn/model.js';
import type { Dataset } from '../table/frame.js';
import type { TableInput } from '../table/raw-table.js';
import { toDataset, type ToDatasetOptions } from '../table/to-dataset.js';
import { readHeldOut } from './held-out-data.js';
import { isDataset } from './is-dataset.js';
import { progressOptions } from './fit-progress.js';
import { learnerTable, tableOptions } from './magic-learners.js';
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


/**
 * Fit with `fit`, showing progress while it runs and the model summary (named `name`) when done.
 * `request` holds the data settings (`data`, `target`, `features`, `exclude`, `weight`, `missingTarget`);
 * every other key is passed to `fit` as a learner option. A table given as `watch` or `pruneOn` (see
 * `tableOptions`) is read like the training rows (`readHeldOut`: same features, dictionaries and classes). When `learner` names a
 * learner of `learnerTable` with a progress callback, the display shows its rounds or trees as they finish.
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
  const rule = Object.hasOwn(learnerTable, learner) ? learnerTable[learner] : undefined;
  const progress = startProgress(`fitting ${name} (${learner})`, { unit: rule?.progress?.unit ?? 'step' });
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
    for (const key of tableOptions) {
      if (options[key] === undefined || isDataset(options[key])) continue;
      options[key] = readHeldOut(options[key] as TableInput, data);
    }
    Object.assign(options, progressOptions(rule, progress, options));
    await new Promise((done) => setImmediate(done));
    const model = await fit(data, options, progress);
    progress.finish(modelBundle(model, name));
    return model;
  } catch (err) {
    progress.fail(err instanceof Error ? err.message : String(err));
    throw err;
  }
}
