/**
 * Dense Gaussian elimination with partial pivoting, for the small systems of a beam line
 * (a few dozen unknowns at most).
 */

/**
 * Solves A·x = b. Returns null when a pivot vanishes relative to the matrix scale (singular).
 * Does not modify its arguments.
 * @example
 * solveLinearSystem([[2, 0], [0, 4]], [2, 8]) // [1, 2]
 */
export function solveLinearSystem(A: number[][], b: number[]): number[] | null {
	const n = b.length;
	const m = A.map((row, i) => [...row, b[i]]);
	const scale = Math.max(1e-300, ...A.map((row) => Math.max(...row.map(Math.abs))));
	for (let c = 0; c < n; c++) {
		let p = c;
		for (let r = c + 1; r < n; r++) if (Math.abs(m[r][c]) > Math.abs(m[p][c])) p = r;
		if (Math.abs(m[p][c]) <= 1e-12 * scale) return null;
		[m[c], m[p]] = [m[p], m[c]];
		for (let r = c + 1; r < n; r++) {
			const f = m[r][c] / m[c][c];
			if (f === 0) continue;
			for (let k = c; k <= n; k++) m[r][k] -= f * m[c][k];
		}
	}
	const x = new Array<number>(n).fill(0);
	for (let r = n - 1; r >= 0; r--) {
		let s = m[r][n];
		for (let k = r + 1; k < n; k++) s -= m[r][k] * x[k];
		x[r] = s / m[r][r];
	}
	return x;
}

/**
 * Rank of a matrix by elimination with rows scaled to unit maximum; entries below `tol` count as 0.
 * @example
 * computeRank([[1, 1], [2, 2]]) // 1
 */
export function computeRank(rows: number[][], tol = 1e-9): number {
	const m = rows.map((r) => {
		const s = Math.max(...r.map(Math.abs));
		return s > 0 ? r.map((v) => v / s) : [...r];
	});
	const cols = m[0]?.length ?? 0;
	let rank = 0;
	for (let c = 0; c < cols && rank < m.length; c++) {
		let p = rank;
		for (let r = rank + 1; r < m.length; r++) if (Math.abs(m[r][c]) > Math.abs(m[p][c])) p = r;
		if (Math.abs(m[p][c]) <= tol) continue;
		[m[rank], m[p]] = [m[p], m[rank]];
		for (let r = rank + 1; r < m.length; r++) {
			const f = m[r][c] / m[rank][c];
			for (let k = c; k < cols; k++) m[r][k] -= f * m[rank][k];
		}
		rank++;
	}
	return rank;
}
