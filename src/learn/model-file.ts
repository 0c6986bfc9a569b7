/**
 * The coppice model file: versioned JSON holding a model's header (features schema, target, settings,
 * seed, fingerprints) and a per-kind body.
 *
 * ```json
 * { "format": "coppice-model", "version": 1, "kind": "tree", "task": "classification",
 *   "features": [...], "target": {...}, "settings": {...}, "seed": 0,
 *   "fingerprint": { "schema": "...", "data": "..." }, "ranges": { "x": [0, 9] },
 *   "created": "2025-01-01T00:00:00.000Z", "body": {...} }
 * ```
 * `ranges` (optional) holds [min, max] of each numeric training feature, for scoring reports.
 * Numbers JSON cannot hold are written as `{ "$number": "NaN" | "Infinity" | "-Infinity" }`. Reading
 * checks every field and never evaluates code; a newer format version is refused with the version
 * this build reads.
 *
 * Each model kind registers a body codec in `modelCodecs` below.
 */
import { rename, readFile, unlink, writeFile } from 'node:fs/promises';
import { errors, CoppiceError } from '../errors.js';
import type { ColumnSchema } from '../table/frame.js';
import type { ModelHeader, ModelKind, TargetInfo } from './model.js';
import type { AnyModel } from './predict.js';
import {
  decodeValue, encodeValue, readArray, readInt, readObject, readString, type JsonValue,
} from './tree/json-values.js';
import { treeCodec } from './tree/tree-codec.js';
// --- ensembles (task G) ---
import { forestCodec } from './ensemble/codec-forest.js';
import { adaBoostCodec } from './ensemble/codec-adaboost.js';
import { boostingCodec } from './ensemble/codec-boosting.js';
import { makeStackCodec } from './ensemble/codec-stack.js';
// --- end ensembles ---

export const MODEL_FORMAT = 'coppice-model';
/** The model-file version this build writes and the newest it reads. */
export const MODEL_VERSION = 1;

/** How one model kind's body is written and read (the header is handled here). */
export interface ModelCodec {
  encode(model: never): { [key: string]: JsonValue };
  /** Check and rebuild the model from its body; throw `errors.badModel` naming the field on bad input. */
  decode(body: unknown, header: ModelHeader): ModelHeader;
}

/** Body codecs by model kind. Ensemble kinds add their entry here. */
export const modelCodecs: Partial<Record<ModelKind, ModelCodec>> = {
  tree: treeCodec,
  // --- ensembles (task G) ---
  bagging: forestCodec,
  forest: forestCodec,
  adaboost: adaBoostCodec,
  boosting: boostingCodec,
  stack: makeStackCodec(modelToJSON, modelFromJSON),
  // --- end ensembles ---
};

const KINDS: readonly ModelKind[] = ['tree', 'bagging', 'forest', 'adaboost', 'boosting', 'stack'];
const PARTS = ['year', 'month', 'day', 'weekday', 'dayOfYear', 'hour', 'epochDays'];

/**
 * A model as a plain JSON object (safe for `JSON.stringify`).
 * @param options.created timestamp to record. __Default:__ the model's own `created`, else now.
 * @example
 * const json = JSON.stringify(modelToJSON(model));
 */
export function modelToJSON(model: ModelHeader, options: { created?: string } = {}): { [key: string]: JsonValue } {
  const codec = modelCodecs[model.kind];
  if (!codec) throw errors.notSupported(`saving a model of kind ${JSON.stringify(model.kind)}`);
  const created = options.created ?? (model as { created?: string }).created ?? new Date().toISOString();
  return {
    format: MODEL_FORMAT,
    version: MODEL_VERSION,
    kind: model.kind,
    task: model.task,
    features: encodeValue(model.features),
    target: encodeValue(model.target),
    settings: encodeValue(model.settings),
    seed: model.seed,
    fingerprint: { schema: model.fingerprint.schema, data: model.fingerprint.data },
    ...(model.ranges ? { ranges: encodeValue(model.ranges) } : {}),
    created,
    body: codec.encode(model as never),
  };
}

function readFeatures(v: unknown): ColumnSchema[] {
  return readArray(v, 'features').map((x, i) => {
    const o = readObject(x, `features[${i}]`);
    const name = readString(o.name, `features[${i}].name`);
    const kind = readString(o.kind, `features[${i}].kind`);
    if (kind !== 'numeric' && kind !== 'boolean' && kind !== 'categorical') throw errors.badModel(`features[${i}].kind should be numeric, boolean or categorical`);
    const col: { name: string; kind: ColumnSchema['kind']; categories?: string[]; origin?: ColumnSchema['origin'] } = { name, kind };
    if (kind === 'categorical') col.categories = readArray(o.categories, `features[${i}].categories`).map((c, j) => readString(c, `features[${i}].categories[${j}]`));
    if (o.origin !== undefined) {
      const g = readObject(o.origin, `features[${i}].origin`);
      const part = readString(g.part, `features[${i}].origin.part`);
      if (!PARTS.includes(part)) throw errors.badModel(`features[${i}].origin.part should be one of ${PARTS.join(', ')}`);
      col.origin = { source: readString(g.source, `features[${i}].origin.source`), part: part as NonNullable<ColumnSchema['origin']>['part'] };
    }
    return col;
  });
}

function readTarget(v: unknown, task: string): TargetInfo {
  const o = readObject(v, 'target');
  const name = readString(o.name, 'target.name');
  const kind = readString(o.kind, 'target.kind');
  if (kind === 'class') {
    if (task !== 'classification') throw errors.badModel('target.kind is class but task is not classification');
    const classes = readArray(o.classes, 'target.classes').map((c, j) => readString(c, `target.classes[${j}]`));
    return { name, kind, classes };
  }
  if (kind === 'number') {
    if (task !== 'regression') throw errors.badModel('target.kind is number but task is not regression');
    return { name, kind };
  }
  throw errors.badModel('target.kind should be class or number');
}

/**
 * Rebuild a model from `modelToJSON` output, checking every field.
 * @example
 * const model = modelFromJSON(JSON.parse(text));
 */
export function modelFromJSON(json: unknown): AnyModel & { readonly created: string } {
  const o = readObject(json, 'the file');
  if (o.format !== MODEL_FORMAT) throw errors.badModel(`not a coppice model (format should be ${JSON.stringify(MODEL_FORMAT)})`);
  const version = readInt(o.version, 'version', 1);
  if (version > MODEL_VERSION) {
    throw errors.badModel(`it was written by a newer coppice (format version ${version}); this build reads version ${MODEL_VERSION}`);
  }
  const kind = readString(o.kind, 'kind') as ModelKind;
  if (!KINDS.includes(kind)) throw errors.badModel(`unknown model kind ${JSON.stringify(kind)}`);
  const codec = modelCodecs[kind];
  if (!codec) throw errors.badModel(`this build cannot read models of kind ${JSON.stringify(kind)}`);
  const task = readString(o.task, 'task');
  if (task !== 'classification' && task !== 'regression') throw errors.badModel('task should be classification or regression');
  const fp = readObject(o.fingerprint, 'fingerprint');
  const settings = decodeValue(readObject(o.settings, 'settings'), 'settings') as Record<string, unknown>;
  const header: ModelHeader = {
    kind, task,
    features: readFeatures(o.features),
    target: readTarget(o.target, task),
    settings,
    seed: readInt(o.seed, 'seed', -4294967296, 4294967296),
    fingerprint: { schema: readString(fp.schema, 'fingerprint.schema'), data: readString(fp.data, 'fingerprint.data') },
    ...(o.ranges === undefined ? {} : { ranges: readRanges(o.ranges) }),
  };
  const created = readString(o.created, 'created');
  if (o.body === undefined) throw errors.badModel('body is missing');
  let model: ModelHeader;
  try {
    model = codec.decode(o.body, header);
  } catch (e) {
    if (e instanceof CoppiceError) throw e;
    throw errors.badModel(e instanceof Error ? e.message : String(e));
  }
  return { ...(model as AnyModel), created };
}

function readRanges(json: unknown): Record<string, [number, number]> {
  const o = readObject(json, 'ranges');
  const out: Record<string, [number, number]> = {};
  for (const [name, v] of Object.entries(o)) {
    const pair = readArray(v, `ranges.${name}`);
    const lo = decodeValue(pair[0], `ranges.${name}[0]`), hi = decodeValue(pair[1], `ranges.${name}[1]`);
    if (pair.length !== 2 || typeof lo !== 'number' || typeof hi !== 'number' || !(lo <= hi)) {
      throw errors.badModel(`ranges.${name} should be [min, max] with min <= max`);
    }
    out[name] = [lo, hi];
  }
  return out;
}

let tempCounter = 0;

/**
 * Write `model` to `path` atomically: a temporary file in the same folder, then a rename, so readers
 * never see half a file.
 * @example
 * await saveModel(model, 'claims-tree.json');
 */
export async function saveModel(model: ModelHeader, path: string): Promise<void> {
  const text = `${JSON.stringify(modelToJSON(model))}\n`;
  const temp = `${path}.${process.pid}.${++tempCounter}.tmp`;
  try {
    await writeFile(temp, text, { encoding: 'utf8', flag: 'wx' });
    await rename(temp, path);
  } catch (e) {
    await unlink(temp).catch(() => undefined);
    throw e;
  }
}

/**
 * Read and check a model file written by `saveModel`.
 * @example
 * const model = await loadModel('claims-tree.json');
 * predictFrame(model, frame);
 */
export async function loadModel(path: string): Promise<AnyModel & { readonly created: string }> {
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    throw errors.badFile(path, code === 'ENOENT' ? 'no such file' : String((e as Error).message));
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    throw errors.badModel(`${JSON.stringify(path)} is not valid JSON (truncated or corrupted)`);
  }
  return modelFromJSON(json);
}
