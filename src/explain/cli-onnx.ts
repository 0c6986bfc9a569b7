/**
 * `coppice export-onnx <model.json> <out.onnx>`: write a saved tree, forest, bagging, AdaBoost or boosted
 * model as an ONNX-ML model (see `modelToOnnx` for its inputs and outputs). Atomic write; never replaces
 * the model file. Exit code 0 when written, 2 with a message on bad input.
 */
import { extname } from 'node:path';
import { errors } from '../errors.js';
import { loadModel } from '../learn/model-file.js';
import { refuseOverwrite, writeFileAtomic } from './atomic-file.js';
import { parseArgs } from './cli-args.js';
import { modelToOnnx } from './onnx-export.js';

const USAGE = 'coppice export-onnx <model.json> <out.onnx>';

/**
 * Run `coppice export-onnx` with the arguments after the command name; resolves to the exit code.
 * @example
 * await main(['model.json', 'model.onnx']); // 0
 */
export async function main(args: string[]): Promise<number> {
  const parsed = parseArgs('export-onnx', args, [], []);
  if (parsed.positional.length !== 2) throw errors.badArguments('export-onnx', `expected a model file and an output file; usage: ${USAGE}`);
  const [modelPath, out] = parsed.positional;
  if (extname(out).toLowerCase() !== '.onnx') throw errors.badArguments('export-onnx', `the output ${JSON.stringify(out)} should end in .onnx`);
  await refuseOverwrite(out, { model: modelPath });
  const model = await loadModel(modelPath);
  const { bytes, summary } = modelToOnnx(model);
  await writeFileAtomic(out, bytes);
  process.stdout.write(
    `Wrote ${out}: ${summary.trees} tree${summary.trees === 1 ? '' : 's'}, ${summary.nodes} nodes; ` +
    `input features float32 [N, ${model.features.length}] (${model.features.map((f) => f.name).join(', ')}); ` +
    `outputs ${summary.outputs.join(', ')}\n`,
  );
  return 0;
}
