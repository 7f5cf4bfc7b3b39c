/**
 * Eigenvalues of a small dense symmetric matrix by the cyclic Jacobi method (rotations that
 * zero one off-diagonal entry at a time). Robust for the 20–60 unknowns of the buckling
 * problems here and needs no package. Reference: Golub & Van Loan, Matrix Computations, 8.5.
 */

/** Most sweeps before giving up; convergence is quadratic, 6–10 sweeps are typical. */
const MAX_SWEEPS = 50;

/**
 * All eigenvalues of a symmetric n×n matrix, ascending.
 * @param a row-major entries (length n·n); not modified
 * @example
 * computeSymmetricEigenvalues(Float64Array.from([2, 1, 1, 2]), 2) // [1, 3]
 */
export function computeSymmetricEigenvalues(a: Float64Array, n: number): number[] {
	if (a.length !== n * n) throw new Error('invariant: matrix must be n×n');
	const m = Float64Array.from(a);
	const scale = Math.max(1e-300, frobenius(m));
	for (let sweep = 0; sweep < MAX_SWEEPS; sweep++) {
		if (offDiagonal(m, n) <= 1e-14 * scale) break;
		for (let p = 0; p < n - 1; p++) {
			for (let q = p + 1; q < n; q++) rotate(m, n, p, q);
		}
	}
	if (offDiagonal(m, n) > 1e-9 * scale) {
		throw new Error('invariant: Jacobi eigenvalue iteration did not converge');
	}
	const out: number[] = [];
	for (let i = 0; i < n; i++) out.push(m[i * n + i]);
	return out.sort((x, y) => x - y);
}

/** Applies one Jacobi rotation in the (p, q) plane that zeroes m[p][q]. */
function rotate(m: Float64Array, n: number, p: number, q: number): void {
	const apq = m[p * n + q];
	if (apq === 0) return;
	const app = m[p * n + p];
	const aqq = m[q * n + q];
	const theta = (aqq - app) / (2 * apq);
	const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
	const c = 1 / Math.sqrt(t * t + 1);
	const s = t * c;
	for (let k = 0; k < n; k++) {
		const akp = m[k * n + p];
		const akq = m[k * n + q];
		m[k * n + p] = c * akp - s * akq;
		m[k * n + q] = s * akp + c * akq;
	}
	for (let k = 0; k < n; k++) {
		const apk = m[p * n + k];
		const aqk = m[q * n + k];
		m[p * n + k] = c * apk - s * aqk;
		m[q * n + k] = s * apk + c * aqk;
	}
	// Exact zero keeps round-off from feeding back into later sweeps.
	m[p * n + q] = 0;
	m[q * n + p] = 0;
}

function frobenius(m: Float64Array): number {
	let s = 0;
	for (const v of m) s += v * v;
	return Math.sqrt(s);
}

function offDiagonal(m: Float64Array, n: number): number {
	let s = 0;
	for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) if (i !== j) s += m[i * n + j] ** 2;
	return Math.sqrt(s);
}
