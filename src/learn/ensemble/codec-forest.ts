/**
 * Model-file body of bagged trees and random forests: `{ trees, combine, oobCurve, importance }`.
 */
import { errors } from '../../errors.js';
import type { ModelHeader } from '../model.js';
import { decodeNumber, encodeNumber, readArray, readInt, readObject, type JsonValue } from '../tree/json-values.js';
import { classOutputs, decodeImportance, decodeTrees, encodeImportance, encodeTrees } from './codec-parts.js';
import type { ForestModel } from './models.js';

export const forestCodec = {
  encode(model: ForestModel): { [key: string]: JsonValue } {
    return {
      trees: encodeTrees(model.trees),
      combine: model.combine,
      oobCurve: model.oobCurve.map((p) => ({ size: p.size, error: encodeNumber(p.error) })),
      importance: encodeImportance(model.importance),
    };
  },
  decode(body: unknown, header: ModelHeader): ForestModel {
    const o = readObject(body, 'body');
    if (o.combine !== 'average' && o.combine !== 'vote') throw errors.badModel("body.combine should be 'average' or 'vote'");
    return {
      ...header,
      kind: header.kind as 'bagging' | 'forest',
      trees: decodeTrees(o.trees, 'body.trees', header.features, classOutputs(header)),
      combine: o.combine,
      oobCurve: readArray(o.oobCurve, 'body.oobCurve').map((x, i) => {
        const p = readObject(x, `body.oobCurve[${i}]`);
        return { size: readInt(p.size, `body.oobCurve[${i}].size`, 1), error: decodeNumber(p.error, `body.oobCurve[${i}].error`) };
      }),
      importance: decodeImportance(o.importance, 'body.importance'),
    };
  },
};
