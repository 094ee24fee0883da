/**
 * The little linear algebra the drive engine needs: matrices are arrays of rows.
 * The engine's matrices have three columns (ω, vx, vy or forward, strafe, yaw), so the
 * pseudo-inverse goes through the 3×3 normal matrix AᵀA and its eigen-decomposition
 * (cyclic Jacobi rotations), which is exact enough for such small, well-scaled problems.
 */
export type Matrix = number[][];

export function transpose(a: Matrix, columns = a[0]?.length ?? 0): Matrix {
  return Array.from({ length: columns }, (_, j) => a.map((row) => row[j]));
}

export function multiply(a: Matrix, b: Matrix): Matrix {
  const inner = b.length;
  const columns = b[0]?.length ?? 0;
  return a.map((row) =>
    Array.from({ length: columns }, (_, j) => {
      let sum = 0;
      for (let k = 0; k < inner; k += 1) sum += row[k] * b[k][j];
      return sum;
    }),
  );
}

export function multiplyVector(a: Matrix, v: number[]): number[] {
  return a.map((row) => row.reduce((sum, value, k) => sum + value * v[k], 0));
}

export function identity(n: number): Matrix {
  return Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? 1 : 0)));
}

/** Eigenvalues and eigenvectors (columns of `vectors`) of a symmetric matrix, by cyclic Jacobi. */
export function symmetricEigen(s: Matrix): { values: number[]; vectors: Matrix } {
  const n = s.length;
  const a = s.map((row) => [...row]);
  const v = identity(n);
  for (let sweep = 0; sweep < 60; sweep += 1) {
    let off = 0;
    for (let p = 0; p < n; p += 1) for (let q = p + 1; q < n; q += 1) off += a[p][q] * a[p][q];
    if (off < 1e-30) break;
    for (let p = 0; p < n; p += 1) {
      for (let q = p + 1; q < n; q += 1) {
        if (Math.abs(a[p][q]) < 1e-300) continue;
        rotate(a, v, p, q);
      }
    }
  }
  return { values: a.map((row, i) => row[i]), vectors: v };
}

function rotate(a: Matrix, v: Matrix, p: number, q: number): void {
  const theta = (a[q][q] - a[p][p]) / (2 * a[p][q]);
  const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
  const c = 1 / Math.sqrt(t * t + 1);
  const s = t * c;
  const n = a.length;
  for (let k = 0; k < n; k += 1) {
    const akp = a[k][p];
    const akq = a[k][q];
    a[k][p] = c * akp - s * akq;
    a[k][q] = s * akp + c * akq;
  }
  for (let k = 0; k < n; k += 1) {
    const apk = a[p][k];
    const aqk = a[q][k];
    a[p][k] = c * apk - s * aqk;
    a[q][k] = s * apk + c * aqk;
  }
  for (let k = 0; k < n; k += 1) {
    const vkp = v[k][p];
    const vkq = v[k][q];
    v[k][p] = c * vkp - s * vkq;
    v[k][q] = s * vkp + c * vkq;
  }
}

/** Relative size below which a singular value counts as zero. */
export const RANK_TOLERANCE = 1e-7;

/**
 * Moore–Penrose pseudo-inverse A⁺ (columns × rows) and the rank of A.
 * A⁺ = (AᵀA)⁺ Aᵀ, with (AᵀA)⁺ from its eigen-decomposition, dropping eigenvalues
 * below (RANK_TOLERANCE · σmax)², so a rank-deficient layout gets the least-squares,
 * minimum-norm answer instead of infinities.
 */
export function pseudoInverse(a: Matrix, columns = a[0]?.length ?? 0): { inverse: Matrix; rank: number } {
  const at = transpose(a, columns);
  const { values, vectors } = symmetricEigen(multiply(at, a));
  const largest = Math.max(0, ...values);
  const cutoff = largest * RANK_TOLERANCE * RANK_TOLERANCE;
  const kept = values.map((value) => largest > 0 && value > cutoff);
  const normalPinv = Array.from({ length: columns }, (_, i) =>
    Array.from({ length: columns }, (_, j) =>
      values.reduce((sum, value, k) => (kept[k] ? sum + (vectors[i][k] * vectors[j][k]) / value : sum), 0),
    ),
  );
  return { inverse: multiply(normalPinv, at), rank: kept.filter(Boolean).length };
}
