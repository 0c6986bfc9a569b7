/**
 * Model-file body of gradient boosting:
 * `{ loss, nOutputs, initial, trees, steps, trainLoss, watchLoss, bestRound, roundsKept, importance }`.
 */
import { errors } from '../../errors.js';
import type { ModelHeader } from '../model.js';
import { readInt, readObject, readString, type JsonValue } from '../tree/json-values.js';
import { decodeImportance, decodeNumbers, decodeTrees, encodeImportance, encodeNumbers, encodeTrees } from './codec-parts.js';
import type { LossName } from './loss/loss.js';
import { lossNames } from './loss/pick.js';
import type { BoostingModel } from './models.js';

export const boostingCodec = {
  encode(model: BoostingModel): { [key: string]: JsonValue } {
    return {
      loss: model.loss, nOutputs: model.nOutputs, initial: encodeNumbers(model.initial), trees: encodeTrees(model.trees),
      steps: encodeNumbers(model.steps), trainLoss: encodeNumbers(model.trainLoss), watchLoss: encodeNumbers(model.watchLoss),
      bestRound: model.bestRound, roundsKept: model.roundsKept, importance: encodeImportance(model.importance),
    };
  },
  decode(body: unknown, header: ModelHeader): BoostingModel {
    const o = readObject(body, 'body');
    const loss = readString(o.loss, 'body.loss') as LossName;
    if (!lossNames.includes(loss)) throw errors.badModel(`body.loss should be one of ${lossNames.join(', ')}`);
    const classLoss = loss === 'logistic' || loss === 'multiclass';
    if (classLoss !== (header.task === 'classification')) throw errors.badModel(`loss ${loss} does not match task ${header.task}`);
    const K = loss === 'multiclass' ? (header.target.classes?.length ?? 0) : 1;
    if (readInt(o.nOutputs, 'body.nOutputs', 1) !== K) throw errors.badModel(`body.nOutputs should be ${K}`);
    const initial = decodeNumbers(o.initial, 'body.initial');
    if (initial.length !== K) throw errors.badModel(`body.initial should have ${K} entries`);
    const roundsKept = readInt(o.roundsKept, 'body.roundsKept', 0);
    const trees = decodeTrees(o.trees, 'body.trees', header.features, 1);
    if (trees.length !== roundsKept * K) throw errors.badModel(`body.trees should hold ${roundsKept * K} trees (roundsKept × nOutputs)`);
    return {
      ...header, kind: 'boosting', loss, nOutputs: K, initial, trees, roundsKept,
      steps: decodeNumbers(o.steps, 'body.steps'),
      trainLoss: decodeNumbers(o.trainLoss, 'body.trainLoss'),
      watchLoss: decodeNumbers(o.watchLoss, 'body.watchLoss'),
      bestRound: readInt(o.bestRound, 'body.bestRound', 0),
      importance: decodeImportance(o.importance, 'body.importance'),
    };
  },
};
