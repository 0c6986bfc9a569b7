/**
 * Model-file body of AdaBoost: `{ trees, stepWeights, rounds, stopReason, prior, importance }`.
 */
import { errors } from '../../errors.js';
import type { ModelHeader } from '../model.js';
import { decodeNumber, encodeNumber, readArray, readInt, readObject, type JsonValue } from '../tree/json-values.js';
import { classOutputs, decodeImportance, decodeNumbers, decodeTrees, encodeImportance, encodeNumbers, encodeTrees } from './codec-parts.js';
import type { AdaBoostModel } from './models.js';

const REASONS = ['rounds', 'perfect', 'guessing'] as const;

export const adaBoostCodec = {
  encode(model: AdaBoostModel): { [key: string]: JsonValue } {
    return {
      trees: encodeTrees(model.trees),
      stepWeights: encodeNumbers(model.stepWeights),
      rounds: model.rounds.map((r) => ({
        round: r.round, weightedError: encodeNumber(r.weightedError), stepWeight: encodeNumber(r.stepWeight),
        trainError: encodeNumber(r.trainError), watchError: encodeNumber(r.watchError),
      })),
      stopReason: model.stopReason,
      prior: encodeNumbers(model.prior),
      importance: encodeImportance(model.importance),
    };
  },
  decode(body: unknown, header: ModelHeader): AdaBoostModel {
    const o = readObject(body, 'body');
    if (header.task !== 'classification') throw errors.badModel('an adaboost model must be a classification model');
    const K = classOutputs(header);
    const trees = decodeTrees(o.trees, 'body.trees', header.features, K);
    const stepWeights = decodeNumbers(o.stepWeights, 'body.stepWeights');
    if (stepWeights.length !== trees.length) throw errors.badModel('body.stepWeights should have one entry per tree');
    const prior = decodeNumbers(o.prior, 'body.prior');
    if (prior.length !== K) throw errors.badModel(`body.prior should have ${K} entries`);
    const stopReason = o.stopReason as AdaBoostModel['stopReason'];
    if (!REASONS.includes(stopReason)) throw errors.badModel(`body.stopReason should be one of ${REASONS.join(', ')}`);
    return {
      ...header, kind: 'adaboost', trees, stepWeights, stopReason, prior,
      rounds: readArray(o.rounds, 'body.rounds').map((x, i) => {
        const r = readObject(x, `body.rounds[${i}]`);
        const at = (k: string): number => decodeNumber(r[k], `body.rounds[${i}].${k}`);
        return { round: readInt(r.round, `body.rounds[${i}].round`, 1), weightedError: at('weightedError'), stepWeight: at('stepWeight'), trainError: at('trainError'), watchError: at('watchError') };
      }),
      importance: decodeImportance(o.importance, 'body.importance'),
    };
  },
};
