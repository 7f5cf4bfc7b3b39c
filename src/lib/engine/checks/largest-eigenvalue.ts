/**
 * The largest eigenvalue of a small dense symmetric matrix: Householder reduction to
 * tridiagonal form, then bisection on the Sturm sequence of the tridiagonal matrix (Golub & Van
 * Loan, Matrix Computations, 8.3.1 and 8.4.1). About n³ operations, several times fewer than a
 * full Jacobi solve, and exact to round-off: the buckling check needs this one eigenvalue many
 * times per segment.
 */

/**
 * Largest eigenvalue of a symmetric n×n matrix.
 * @param a row-major entries (length n·n); only the lower triangle is read, and not modified
 * @example
 * computeLargestEigenvalue(Float64Array.from([2, 1, 1, 2]), 2) // 3
 */
export function computeLargestEigenvalue(a: Float64Array, n: number): number {
	if (a.length !== n * n) throw new Error('invariant: matrix must be n×n');
	const { d, e } = reduceToTridiagonal(a, n);
	return findLargestTridiagonal(d, e);
}

/** Working arrays of the last size solved (the check solves thousands of same-size matrices). */
let scratch: {
	n: number;
	m: Float64Array;
	d: Float64Array;
	e: Float64Array;
	v: Float64Array;
	p: Float64Array;
} | null = null;

/** Diagonal d (n) and sub-diagonal e (n − 1) of a tridiagonal matrix similar to a. */
function reduceToTridiagonal(a: Float64Array, n: number): { d: Float64Array; e: Float64Array } {
	if (scratch?.n !== n) {
		scratch = {
			n,
			m: new Float64Array(n * n),
			d: new Float64Array(n),
			e: new Float64Array(Math.max(0, n - 1)),
			v: new Float64Array(n),
			p: new Float64Array(n)
		};
	}
	const { m, d, e, v, p } = scratch;
	// Only the lower triangle is read and kept (the matrix stays symmetric throughout).
	m.set(a);
	d.fill(0);
	e.fill(0);
	v.fill(0);
	p.fill(0);
	for (let k = 0; k < n - 2; k++) {
		// Reflector that zeroes column k below the sub-diagonal: H = I − v vᵀ·(2/vᵀv).
		let norm = 0;
		for (let i = k + 1; i < n; i++) norm += m[i * n + k] ** 2;
		norm = Math.sqrt(norm);
		d[k] = m[k * n + k];
		const x0 = m[(k + 1) * n + k];
		if (norm === 0) {
			e[k] = 0;
			continue;
		}
		const alpha = x0 > 0 ? -norm : norm;
		e[k] = alpha;
		for (let i = k + 1; i < n; i++) v[i] = m[i * n + k];
		v[k + 1] -= alpha;
		let vv = 0;
		for (let i = k + 1; i < n; i++) vv += v[i] * v[i];
		if (vv === 0) continue;
		const beta = 2 / vv;
		// p = β·A v from the lower triangle, row by row (each entry below the diagonal serves
		// both its row and its column), then q = p − (β·vᵀp/2)·v.
		for (let i = k + 1; i < n; i++) p[i] = 0;
		for (let i = k + 1; i < n; i++) {
			const row = i * n;
			const vi = v[i];
			let s = m[row + i] * vi;
			for (let j = k + 1; j < i; j++) {
				const x = m[row + j];
				s += x * v[j];
				p[j] += x * vi;
			}
			p[i] += s;
		}
		let vp = 0;
		for (let i = k + 1; i < n; i++) {
			p[i] *= beta;
			vp += v[i] * p[i];
		}
		const half = (beta * vp) / 2;
		for (let i = k + 1; i < n; i++) p[i] -= half * v[i];
		// A ← A − v qᵀ − q vᵀ on the lower triangle of the trailing block.
		for (let i = k + 1; i < n; i++) {
			const row = i * n;
			const vi = v[i];
			const pi = p[i];
			for (let j = k + 1; j <= i; j++) m[row + j] -= vi * p[j] + pi * v[j];
		}
	}
	if (n >= 2) {
		d[n - 2] = m[(n - 2) * n + n - 2];
		e[n - 2] = m[(n - 1) * n + n - 2];
	}
	if (n >= 1) d[n - 1] = m[(n - 1) * n + n - 1];
	return { d, e };
}

/** Most bisection steps; each halves the bracket, so 2100 more than covers any double range. */
const MAX_STEPS = 2100;

/** Largest eigenvalue of the tridiagonal (d, e) by bisection on the count of smaller ones. */
function findLargestTridiagonal(d: Float64Array, e: Float64Array): number {
	const n = d.length;
	if (n === 0) return 0;
	// Gershgorin discs bracket every eigenvalue.
	let lo = Infinity;
	let hi = -Infinity;
	let scale = 0;
	for (let i = 0; i < n; i++) {
		const r = (i > 0 ? Math.abs(e[i - 1]) : 0) + (i < n - 1 ? Math.abs(e[i]) : 0);
		lo = Math.min(lo, d[i] - r);
		hi = Math.max(hi, d[i] + r);
		scale = Math.max(scale, Math.abs(d[i]) + r);
	}
	if (scale === 0) return 0;
	const tiny = Number.MIN_VALUE / Number.EPSILON;
	for (let step = 0; step < MAX_STEPS; step++) {
		const mid = lo + (hi - lo) / 2;
		if (mid <= lo || mid >= hi) break;
		if (countBelow(d, e, mid, tiny) === n) hi = mid;
		else lo = mid;
	}
	return lo + (hi - lo) / 2;
}

/** Number of eigenvalues below x (Sturm sequence: negative pivots of T − xI). */
function countBelow(d: Float64Array, e: Float64Array, x: number, tiny: number): number {
	let count = 0;
	let q = d[0] - x;
	for (let i = 0; ; i++) {
		if (q === 0) q = -tiny;
		if (q < 0) count++;
		if (i === d.length - 1) return count;
		q = d[i + 1] - x - (e[i] * e[i]) / q;
	}
}
