/**
 * The model header every ensemble carries (src/learn/model.ts): features, target, settings, seed and
 * fingerprints of the training data.
 */
import { dataFingerprint } from '../../table/fingerprint.js';
import { featureRangesOf } from '../../table/ranges.js';
import type { Dataset } from '../../table/frame.js';
import type { ModelHeader, ModelKind } from '../model.js';

/**
 * Header for a model of `kind` fitted on `data` with `settings` and `seed`.
 * @example
 * const header = ensembleHeader('forest', data, settings, 42);
 */
export function ensembleHeader(kind: ModelKind, data: Dataset, settings: Record<string, unknown>, seed: number): ModelHeader {
  const t = data.target;
  return {
    kind,
    task: t.kind === 'class' ? 'classification' : 'regression',
    features: data.features.schema.columns,
    target: t.kind === 'class' ? { name: t.name, kind: 'class', classes: t.classes } : { name: t.name, kind: 'number' },
    settings,
    ranges: featureRangesOf(data.features),
    seed,
    fingerprint: { schema: data.features.schema.fingerprint, data: dataFingerprint(data) },
  };
}
