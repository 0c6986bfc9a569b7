/**
 * The kernels as one interface, implemented twice: by the WebAssembly module (build/kernels.wasm) and by
 * the TypeScript twins. Both work on the same arena memory with the layout in layout.ts.
 */
import type { TreePtrs } from './ts-predict.js';

export interface KernelSet {
  /** 'wasm' or 'ts'. */
  readonly name: 'wasm' | 'ts';
  gatherValue(rowsPtr: number, count: number, wPtr: number, yPtr: number, gwPtr: number, gsPtr: number, statsPtr: number): void;
  gatherClass(rowsPtr: number, count: number, wPtr: number, clsPtr: number, gwPtr: number, gcPtr: number, nClasses: number, statsPtr: number): void;
  histValue(codesPtr: number, nRows: number, rowsPtr: number, count: number, gwPtr: number, gsPtr: number,
    featsPtr: number, nFeats: number, histPtr: number): void;
  histClass(codesPtr: number, nRows: number, rowsPtr: number, count: number, gwPtr: number, gcPtr: number,
    nClasses: number, featsPtr: number, nFeats: number, histPtr: number): void;
  histSubtract(parentPtr: number, childPtr: number, outPtr: number, featsPtr: number, nFeats: number, stride: number): void;
  partitionRows(colPtr: number, rowsPtr: number, count: number, lutPtr: number, scratchPtr: number): number;
  scanValue(blockPtr: number, nBins: number, mean: number, leafRows: number, leafWeight: number, tol: number, outPtr: number): void;
  histValueSparse(codesPtr: number, nRows: number, rowsPtr: number, count: number, gwPtr: number, gsPtr: number,
    featsPtr: number, nFeats: number, histPtr: number, binsPtr: number, lensPtr: number, markPtr: number): void;
  scanValueList(blockPtr: number, binsPtr: number, nList: number, nBins: number, mean: number, leafRows: number, leafWeight: number, tol: number, outPtr: number): void;
  predictLeaves(tree: TreePtrs, dataPtr: number, nRows: number, outPtr: number): void;
}
