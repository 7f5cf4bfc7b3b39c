/**
 * Solutions of the equilibrium equations E z = f as z = z_p + N·y: a particular solution and a
 * basis of the self-stress (redundant) directions, from the reduced row echelon form.
 */

/** The general solution of E z = f, or the reason there is none. */
export interface SolutionSpace {
	/** One solution (free variables zero). */
	particular: number[];
	/** Columns: a basis of {z : E z = 0}, stored as basis[k][i] = component i of vector k. */
	basis: number[][];
	/** Rank of E. */
	rank: number;
	/** False when E z = f has no solution (within rounding). */
	consistent: boolean;
}

/** Relative size below which a pivot counts as zero. */
const PIVOT_TOLERANCE = 1e-11;

/** Reduced row echelon form of [E | f] with partial pivoting; returns the pivot columns. */
function reduceRows(A: number[][], n: number): number[] {
	const pivots: number[] = [];
	let row = 0;
	const scale = Math.max(1e-300, ...A.flatMap((r) => r.slice(0, n).map(Math.abs)));
	for (let col = 0; col < n && row < A.length; col++) {
		let best = row;
		for (let r = row + 1; r < A.length; r++)
			if (Math.abs(A[r][col]) > Math.abs(A[best][col])) best = r;
		if (Math.abs(A[best][col]) <= PIVOT_TOLERANCE * scale) continue;
		[A[row], A[best]] = [A[best], A[row]];
		const p = A[row][col];
		for (let c = 0; c <= n; c++) A[row][c] /= p;
		for (let r = 0; r < A.length; r++) {
			if (r === row || A[r][col] === 0) continue;
			const factor = A[r][col];
			for (let c = 0; c <= n; c++) A[r][c] -= factor * A[row][c];
		}
		pivots.push(col);
		row++;
	}
	return pivots;
}

/** General solution of E z = f (E is m × n). */
export function solveEquilibrium(E: number[][], f: number[]): SolutionSpace {
	const n = E[0]?.length ?? 0;
	const A = E.map((r, i) => [...r, f[i]]);
	const pivots = reduceRows(A, n);
	const rank = pivots.length;
	const fScale = Math.max(1, ...f.map(Math.abs));
	let consistent = true;
	for (let r = rank; r < A.length; r++) if (Math.abs(A[r][n]) > 1e-9 * fScale) consistent = false;
	const particular = new Array<number>(n).fill(0);
	pivots.forEach((col, r) => (particular[col] = A[r][n]));
	const free = [];
	for (let c = 0; c < n; c++) if (!pivots.includes(c)) free.push(c);
	const basis = free.map((fc) => {
		const v = new Array<number>(n).fill(0);
		v[fc] = 1;
		pivots.forEach((col, r) => (v[col] = -A[r][fc]));
		return v;
	});
	return { particular, basis, rank, consistent };
}

/** Solves the square system A x = b (Gaussian elimination, partial pivoting); null if singular. */
export function solveSquare(A: number[][], b: number[]): number[] | null {
	const n = b.length;
	const M = A.map((r, i) => [...r, b[i]]);
	const pivots = reduceRows(M, n);
	if (pivots.length < n) return null;
	return M.map((r) => r[n]);
}
