/**
 * Model-file body of a stack: `{ members: [{ name, model }], combiner, passThrough, folds, memberScores }`.
 * Each member is a whole model file object, written and read through the registry functions passed to
 * `makeStackCodec` (so this file does not import the registry that lists it).
 */
import { errors } from '../../errors.js';
import type { ModelHeader } from '../model.js';
import { readArray, readFloats, readInt, readObject, readString, type JsonValue } from '../tree/json-values.js';
import { decodeNumbers, encodeNumbers } from './codec-parts.js';
import type { LogisticCombiner } from './logistic-combiner.js';
import type { StackModel } from './models.js';
import type { RidgeCombiner } from './ridge-combiner.js';

type ToJson = (m: ModelHeader, options: { created?: string }) => { [key: string]: JsonValue };
type FromJson = (j: unknown) => ModelHeader;

function encodeCombiner(c: LogisticCombiner | RidgeCombiner): { [key: string]: JsonValue } {
  const scaling = { center: encodeNumbers(Array.from(c.scaling.center)), scale: encodeNumbers(Array.from(c.scaling.scale)) };
  return c.kind === 'ridge'
    ? { kind: 'ridge', p: c.p, ...scaling, intercept: c.intercept, coef: encodeNumbers(Array.from(c.coef)) }
    : { kind: 'logistic', p: c.p, nClasses: c.nClasses, ...scaling, theta: encodeNumbers(Array.from(c.theta)) };
}

function decodeCombiner(v: unknown, header: ModelHeader, p: number): LogisticCombiner | RidgeCombiner {
  const o = readObject(v, 'body.combiner');
  if (readInt(o.p, 'body.combiner.p', 0) !== p) throw errors.badModel(`body.combiner.p should be ${p}`);
  const scaling = { center: readFloats(o.center, 'body.combiner.center', p), scale: readFloats(o.scale, 'body.combiner.scale', p) };
  if (o.kind === 'ridge' && header.task === 'regression') {
    return { kind: 'ridge', p, scaling, intercept: readFloats([o.intercept], 'body.combiner.intercept', 1)[0], coef: readFloats(o.coef, 'body.combiner.coef', p) };
  }
  if (o.kind === 'logistic' && header.task === 'classification') {
    const K = header.target.classes?.length ?? 0;
    if (readInt(o.nClasses, 'body.combiner.nClasses', 2) !== K) throw errors.badModel(`body.combiner.nClasses should be ${K}`);
    return { kind: 'logistic', p, nClasses: K, scaling, theta: readFloats(o.theta, 'body.combiner.theta', (p + 1) * (K - 1)) };
  }
  throw errors.badModel(`body.combiner.kind should be ${header.task === 'regression' ? 'ridge' : 'logistic'}`);
}

/**
 * The stack codec, given the registry's whole-model writer and reader.
 * @example
 * modelCodecs.stack = makeStackCodec(modelToJSON, modelFromJSON);
 */
export function makeStackCodec(toJson: ToJson, fromJson: FromJson) {
  return {
    encode(model: StackModel): { [key: string]: JsonValue } {
      return {
        // a member's own time stamp when it has one; else a fixed marker, so the same stack writes the same JSON
        members: model.members.map((m) => ({ name: m.name, model: toJson(m.model, { created: (m.model as { created?: string }).created ?? 'with the stack' }) })),
        combiner: encodeCombiner(model.combiner),
        passThrough: [...model.passThrough],
        folds: model.folds,
        memberScores: model.memberScores.map((s) => ({ name: s.name, score: encodeNumbers([s.score])[0] })),
      };
    },
    decode(body: unknown, header: ModelHeader): StackModel {
      const o = readObject(body, 'body');
      const members = readArray(o.members, 'body.members').map((x, i) => {
        const m = readObject(x, `body.members[${i}]`);
        const model = fromJson(m.model);
        if (model.task !== header.task) throw errors.badModel(`body.members[${i}] is a ${model.task} model in a ${header.task} stack`);
        return { name: readString(m.name, `body.members[${i}].name`), model };
      });
      if (members.length === 0) throw errors.badModel('body.members is empty');
      const passThrough = readArray(o.passThrough, 'body.passThrough').map((x, i) => readString(x, `body.passThrough[${i}]`));
      const width = header.task === 'classification' ? (header.target.classes?.length ?? 0) : 1;
      return {
        ...header, kind: 'stack', members, passThrough,
        combiner: decodeCombiner(o.combiner, header, members.length * width + passThrough.length),
        folds: readInt(o.folds, 'body.folds', 2),
        memberScores: readArray(o.memberScores, 'body.memberScores').map((x, i) => {
          const s = readObject(x, `body.memberScores[${i}]`);
          return { name: readString(s.name, `body.memberScores[${i}].name`), score: decodeNumbers([s.score], `body.memberScores[${i}].score`)[0] };
        }),
      };
    },
  };
}
