export type { FlatTree } from './flat-tree.js';
export type { ModelHeader, ModelKind, Predictions, TargetInfo, Task } from './model.js';
