/**
 * A small dense two-phase simplex for linear programs in the form
 *   maximise cᵀy  subject to  G y ≤ h  (y free),
 * solved through its dual  minimise hᵀw  subject to  Gᵀw = c, w ≥ 0.  The dual has as many
 * equations as y has components (a handful: the redundants and λ), so the tableau stays tiny
 * however many points are checked, and w is exactly the mechanism (hinge rotations).
 */
import { solveSquare } from './nullspace';

/** Outcome of `solveLinearProgram`. */
export type LinearProgramResult =
	| { status: 'optimal'; y: number[]; w: number[]; objective: number; basis: number[] }
	| { status: 'unbounded' } /* cᵀy grows without limit (the dual has no solution) */
	| { status: 'infeasible' }; /* no y satisfies G y ≤ h (the dual is unbounded) */

const TOL = 1e-11;
// Pricing must see constraint violations near rounding level, or the last refinement is ignored.
const PRICE_TOL = 1e-14;

interface Tableau {
	T: number[][];
	rhs: number[];
	basis: number[];
	/** Original row signs (rows with negative c were negated). */
	sign: number[];
	m: number;
}

function pivot(tab: Tableau, row: number, col: number): void {
	const { T, rhs } = tab;
	const p = T[row][col];
	const pr = T[row];
	for (let j = 0; j < pr.length; j++) pr[j] /= p;
	rhs[row] /= p;
	for (let i = 0; i < T.length; i++) {
		if (i === row) continue;
		const f = T[i][col];
		if (f === 0) continue;
		const r = T[i];
		for (let j = 0; j < r.length; j++) r[j] -= f * pr[j];
		rhs[i] -= f * rhs[row];
	}
	tab.basis[row] = col;
}

/** Runs simplex iterations for the given column costs; false when unbounded. */
function iterate(tab: Tableau, cost: (j: number) => number, allowed: (j: number) => boolean): boolean {
	const { T, rhs, basis } = tab;
	const cols = T[0].length;
	let degenerate = 0;
	for (let iter = 0; iter < 100 * cols; iter++) {
		const bland = degenerate > 2 * T.length;
		let enter = -1;
		let best = -PRICE_TOL;
		for (let j = 0; j < cols; j++) {
			if (!allowed(j) || basis.includes(j)) continue;
			let r = cost(j);
			for (let i = 0; i < T.length; i++) r -= cost(basis[i]) * T[i][j];
			if (r < best) {
				enter = j;
				best = r;
				if (bland) break;
			}
		}
		if (enter < 0) return true;
		let leave = -1;
		let ratio = Infinity;
		for (let i = 0; i < T.length; i++) {
			if (T[i][enter] <= TOL) continue;
			const q = rhs[i] / T[i][enter];
			if (q < ratio - 1e-14 || (Math.abs(q - ratio) <= 1e-14 && basis[i] < basis[leave])) {
				ratio = q;
				leave = i;
			}
		}
		if (leave < 0) return false;
		degenerate = ratio <= 1e-14 ? degenerate + 1 : 0;
		pivot(tab, leave, enter);
	}
	throw new Error('invariant: simplex did not terminate');
}

/** Maximises cᵀy subject to G y ≤ h with y free (G has one row per inequality). */
export function solveLinearProgram(G: number[][], h: number[], c: number[]): LinearProgramResult {
	const m = G.length;
	const d = c.length;
	const sign = c.map((v) => (v < 0 ? -1 : 1));
	const T = Array.from({ length: d }, (_, i) => {
		const row = new Array<number>(m + d).fill(0);
		for (let j = 0; j < m; j++) row[j] = sign[i] * G[j][i];
		row[m + i] = 1;
		return row;
	});
	const tab: Tableau = { T, rhs: c.map((v, i) => sign[i] * v), basis: c.map((_, i) => m + i), sign, m };
	iterate(tab, (j) => (j >= m ? 1 : 0), () => true);
	const infeasibility = tab.rhs.reduce((s, v, i) => s + (tab.basis[i] >= m ? v : 0), 0);
	if (infeasibility > 1e-9) return { status: 'unbounded' };
	// Drive artificials out of the basis where a real column can replace them.
	for (let i = 0; i < d; i++) {
		if (tab.basis[i] < m) continue;
		let col = -1;
		for (let j = 0; j < m; j++) if (!tab.basis.includes(j) && Math.abs(T[i][j]) > 1e-9) col = j;
		if (col >= 0) pivot(tab, i, col);
	}
	if (!iterate(tab, (j) => (j >= m ? 0 : h[j]), (j) => j < m || tab.basis.includes(j))) {
		return { status: 'infeasible' };
	}
	return readSolution(tab, G, h, c);
}

/** Reads w and y from the final tableau, re-solving the basic system for accuracy. */
function readSolution(tab: Tableau, G: number[][], h: number[], c: number[]): LinearProgramResult {
	const { T, basis, sign, m } = tab;
	const d = c.length;
	const w = new Array<number>(m).fill(0);
	basis.forEach((b, i) => {
		if (b < m) w[b] = Math.max(0, tab.rhs[i]);
	});
	// Simplex multipliers: yᵢ = signᵢ Σ_k h_{B_k} (B⁻¹)_{k,i}; B⁻¹ sits in the artificial columns.
	let y = new Array<number>(d).fill(0);
	for (let i = 0; i < d; i++) {
		let s = 0;
		for (let k = 0; k < d; k++) if (basis[k] < m) s += h[basis[k]] * T[k][m + i];
		y[i] = sign[i] * s;
	}
	if (basis.every((b) => b < m)) {
		const GB = basis.map((b) => G[b]);
		const yExact = solveSquare(GB, basis.map((b) => h[b]));
		const transposed = Array.from({ length: d }, (_, i) => basis.map((b) => G[b][i]));
		const wB = solveSquare(transposed, c);
		if (yExact) y = yExact;
		if (wB) basis.forEach((b, k) => (w[b] = Math.max(0, wB[k])));
	}
	const objective = c.reduce((s, v, i) => s + v * y[i], 0);
	return { status: 'optimal', y, w, objective, basis: basis.filter((b) => b < m) };
}
