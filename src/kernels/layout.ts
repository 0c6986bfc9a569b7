/**
 * Memory layout shared by the WebAssembly kernels (assembly/kernels.ts) and their TypeScript twins.
 *
 * One linear memory (a shared `WebAssembly.Memory`, so its buffer is a SharedArrayBuffer that workers can
 * map too) holds every region; kernels receive byte offsets ("pointers"). All numbers are little-endian.
 * Bytes [0, RESERVED) belong to the wasm module; the arena (arena.ts) hands out the rest, 64-byte aligned.
 *
 * | region          | type      | layout                                                              |
 * |-----------------|-----------|---------------------------------------------------------------------|
 * | codes           | u8        | column-major bins: feature f, row r at codes + f·nRows + r; 255 = missing |
 * | rows            | i32       | row indices; each tree node owns a contiguous segment                |
 * | w, y            | f64       | per-row weight and response (value response), indexed by row        |
 * | cls             | i32       | per-row class code (class response), indexed by row                  |
 * | gw, gs / gc     | f64 / i32 | a node's rows gathered in segment order: weight, weight·y / class    |
 * | feats           | i32       | list of feature indices a histogram call covers                      |
 * | hist            | f64       | per feature f a block of 256 bins × stride doubles at hist + f·256·stride·8 |
 * |                 |           | value: stride 3 = [rows, Σw, Σw·y]; class: stride 1+K = [rows, Σw class 0..K-1] |
 * | lut             | u8[256]   | partition table: 1 = the bin goes left                               |
 * | scan out        | f64[8]    | [score, bin, leftRows, leftW, leftS, knownRows, knownW, knownS]      |
 * | tree arrays     | FlatTree  | kind u8, feature i32, threshold f64, left/right/missing/offset/width/branches i32, catBits u32 |
 * | data            | f64       | column-major feature values for prediction (categorical code as a number, <0 missing) |
 */
export const RESERVED = 65536;
export const BINS = 256;
export const MISSING = 255;
export const PAGE = 65536;
/** 2 GiB: the most memory the arena may grow to. */
export const MAX_PAGES = 32768;
/** Doubles per bin in a value histogram. */
export const VALUE_STRIDE = 3;
/** Doubles per bin in a class histogram with `k` classes. */
export function classStride(k: number): number {
  return 1 + k;
}
