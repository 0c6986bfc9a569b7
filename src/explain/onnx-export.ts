/**
 * A coppice tree model as an ONNX model (ONNX IR version 8; opsets ai.onnx 13 and ai.onnx.ml 3), built
 * on the additive form (`additiveModelOf`): one ai.onnx.ml TreeEnsembleRegressor sums every tree's leaf
 * values into K raw outputs (base values = the constant part), then standard operators apply the link.
 *
 * Graph input `features`: float32 [N, p], the model's feature columns in order; numbers as they are,
 * booleans as 0/1, categories as their code in the model's dictionary (metadata `coppice.features`);
 * missing values and unseen categories as NaN (an unknown code also follows the missing-value branch).
 * Graph outputs:
 * - regression: `prediction` float32 [N, 1] (exp of the raw score for a Poisson boosted model);
 * - classification: `probabilities` float32 [N, K] (tree or forest class probabilities or vote shares,
 *   AdaBoost vote shares, boosting: logistic of the margin as [1 − p, p], or softmax of K scores) and
 *   `label` int64 [N], the index of the most probable class (first on ties), as in coppice.
 * Trees use the regressor even for classes so that every model kind keeps coppice's exact arithmetic.
 */
import { errors } from '../errors.js';
import type { ModelHeader } from '../learn/model.js';
import { additiveModelOf } from './additive-model.js';
import { ensembleTuples } from './onnx-tree-nodes.js';
import { encodeOnnxModel, ONNX_FLOAT, ONNX_INT64, type OnnxNode, type OnnxTensor, type OnnxValueInfo } from './onnx-proto.js';

const ML = 'ai.onnx.ml';

/** Summary of an export, for messages. */
export interface OnnxSummary {
  readonly trees: number;
  readonly nodes: number;
  readonly inputs: readonly string[];
  readonly outputs: readonly string[];
}

/**
 * Encode `model` (tree, bagging, forest, AdaBoost or boosting) as ONNX bytes.
 * @param options.producerVersion version recorded in the file. __Default:__ '0.1.0'.
 * @example
 * const { bytes } = modelToOnnx(forest);
 * await writeFile('forest.onnx', bytes);
 */
export function modelToOnnx(model: ModelHeader, options: { producerVersion?: string } = {}): { bytes: Uint8Array; summary: OnnxSummary } {
  const form = additiveModelOf(model);
  const K = form.nOutputs, p = form.features.length;
  if (p === 0) throw errors.onnxExport('the model has no feature columns');
  const t = ensembleTuples(form.members, form.features);
  if (t.nodeIds.length === 0) {
    // no trees kept (e.g. boosting stopped at round 0): one empty leaf so the operator has a tree; output = base
    t.treeIds.push(0); t.nodeIds.push(0); t.featureIds.push(0); t.modes.push('LEAF'); t.values.push(0);
    t.trueIds.push(0); t.falseIds.push(0); t.missingTrue.push(0);
  }
  const nodes: OnnxNode[] = [{
    opType: 'TreeEnsembleRegressor', domain: ML, name: 'trees', inputs: ['features'], outputs: ['scores'],
    attributes: [
      { name: 'n_targets', type: 'int', value: K },
      { name: 'aggregate_function', type: 'string', value: 'SUM' },
      { name: 'post_transform', type: 'string', value: 'NONE' },
      { name: 'base_values', type: 'floats', values: form.base },
      { name: 'nodes_treeids', type: 'ints', values: t.treeIds },
      { name: 'nodes_nodeids', type: 'ints', values: t.nodeIds },
      { name: 'nodes_featureids', type: 'ints', values: t.featureIds },
      { name: 'nodes_modes', type: 'strings', values: t.modes },
      { name: 'nodes_values', type: 'floats', values: t.values },
      { name: 'nodes_truenodeids', type: 'ints', values: t.trueIds },
      { name: 'nodes_falsenodeids', type: 'ints', values: t.falseIds },
      { name: 'nodes_missing_value_tracks_true', type: 'ints', values: t.missingTrue },
      { name: 'target_treeids', type: 'ints', values: t.targetTreeIds },
      { name: 'target_nodeids', type: 'ints', values: t.targetNodeIds },
      { name: 'target_ids', type: 'ints', values: t.targetIds },
      { name: 'target_weights', type: 'floats', values: t.targetWeights },
    ],
  }];
  const initializers: OnnxTensor[] = [];
  const outputs: OnnxValueInfo[] = [];
  if (model.task === 'regression') {
    if (form.link === 'exp') nodes.push({ opType: 'Exp', name: 'mean', inputs: ['scores'], outputs: ['prediction'], attributes: [] });
    else nodes.push({ opType: 'Identity', name: 'value', inputs: ['scores'], outputs: ['prediction'], attributes: [] });
    outputs.push({ name: 'prediction', elemType: ONNX_FLOAT, dims: ['N', 1], doc: `predicted ${model.target.name}` });
  } else {
    const classes = model.target.classes ?? [];
    if (form.link === 'logistic') {
      initializers.push({ name: 'one', dims: [], dataType: ONNX_FLOAT, values: [1] });
      nodes.push(
        { opType: 'Sigmoid', name: 'positive', inputs: ['scores'], outputs: ['p_second'], attributes: [] },
        { opType: 'Sub', name: 'negative', inputs: ['one', 'p_second'], outputs: ['p_first'], attributes: [] },
        { opType: 'Concat', name: 'both', inputs: ['p_first', 'p_second'], outputs: ['probabilities'], attributes: [{ name: 'axis', type: 'int', value: 1 }] },
      );
    } else if (form.link === 'softmax') {
      nodes.push({ opType: 'Softmax', name: 'normalise', inputs: ['scores'], outputs: ['probabilities'], attributes: [{ name: 'axis', type: 'int', value: 1 }] });
    } else {
      nodes.push({ opType: 'Identity', name: 'shares', inputs: ['scores'], outputs: ['probabilities'], attributes: [] });
    }
    nodes.push({
      opType: 'ArgMax', name: 'most_probable', inputs: ['probabilities'], outputs: ['label'],
      attributes: [{ name: 'axis', type: 'int', value: 1 }, { name: 'keepdims', type: 'int', value: 0 }],
    });
    outputs.push(
      { name: 'probabilities', elemType: ONNX_FLOAT, dims: ['N', classes.length], doc: `class probabilities in the order ${classes.join(', ')}` },
      { name: 'label', elemType: ONNX_INT64, dims: ['N'], doc: 'index of the most probable class' },
    );
  }
  const features = form.features.map((f) => (f.kind === 'categorical' ? { name: f.name, kind: f.kind, categories: f.categories ?? [] } : { name: f.name, kind: f.kind }));
  const bytes = encodeOnnxModel({
    irVersion: 8,
    opsets: [{ domain: '', version: 13 }, { domain: ML, version: 3 }],
    producerName: 'coppice',
    producerVersion: options.producerVersion ?? '0.1.0',
    doc: `coppice ${model.kind} model (${model.task}) of ${model.target.name}`,
    graph: {
      name: `coppice_${model.kind}`,
      nodes,
      inputs: [{ name: 'features', elemType: ONNX_FLOAT, dims: ['N', p], doc: `columns: ${form.features.map((f) => f.name).join(', ')}` }],
      outputs,
      initializers,
    },
    metadata: {
      'coppice.kind': model.kind,
      'coppice.task': model.task,
      'coppice.target': model.target.name,
      'coppice.features': JSON.stringify(features),
      ...(model.task === 'classification' ? { 'coppice.classes': JSON.stringify(model.target.classes ?? []) } : {}),
      'coppice.fingerprint': JSON.stringify(model.fingerprint),
    },
  });
  return { bytes, summary: { trees: form.members.length, nodes: t.nodeIds.length, inputs: ['features'], outputs: outputs.map((o) => o.name) } };
}
