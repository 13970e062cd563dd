/**
 * Compressed sparse row matrix, both triangles stored (a symmetric matrix keeps its full
 * pattern so graph algorithms can walk rows). Column indices are sorted within each row.
 */
export interface CsrMatrix {
  n: number;
  rowPtr: Int32Array;
  colIdx: Int32Array;
  values: Float64Array;
}
