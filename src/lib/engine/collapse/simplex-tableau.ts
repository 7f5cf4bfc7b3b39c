/**
 * The tableau of the dual simplex (see simplex.ts): creation, added rows, pivots, the pricing
 * loop and re-inversion from the original data. Columns 0…d−1 are artificials; column d + j
 * belongs to row j of G.
 */
import { solveSquare } from './nullspace';

/** Pivot entries smaller than this are treated as zero. */
export const PIVOT_TOL = 1e-11;
/** Pricing must see constraint violations near rounding level, or the last refinement is ignored. */
export const PRICE_TOL = 1e-14;

/** Tableau of the dual: columns 0…d−1 are artificials, column d + j belongs to row j of G. */
export interface LinearProgram {
	d: number;
	c: number[];
	G: number[][];
	h: number[];
	T: number[][];
	rhs: number[];
	basis: number[];
	inBasis: boolean[];
	sign: number[];
	/** True once phase 1 is over. */
	warm: boolean;
}

/** An empty program maximising cᵀy. */
export function createProgram(c: number[]): LinearProgram {
	const d = c.length;
	const sign = c.map((v) => (v < 0 ? -1 : 1));
	const T: number[][] = [];
	for (let i = 0; i < d; i++) {
		const row = new Array<number>(d).fill(0);
		row[i] = 1;
		T.push(row);
	}
	const rhs = c.map((v, i) => sign[i] * v);
	const basis = c.map((_, i) => i);
	const inBasis = c.map(() => true);
	return { d, c, G: [], h: [], T, rhs, basis, inBasis, sign, warm: false };
}

/** Adds the inequality g·y ≤ hj. */
export function addRow(lp: LinearProgram, g: number[], hj: number): void {
	const { d, T, sign } = lp;
	lp.G.push(g);
	lp.h.push(hj);
	lp.inBasis.push(false);
	// Tableau column = B⁻¹·(S g); B⁻¹ is held in the artificial columns.
	for (let i = 0; i < d; i++) {
		const row = T[i];
		let s = 0;
		for (let k = 0; k < d; k++) s += row[k] * sign[k] * g[k];
		row.push(s);
	}
}

/** Gauss–Jordan pivot on row r, column col; column col enters the basis. */
export function pivot(lp: LinearProgram, r: number, col: number): void {
	const { T, rhs } = lp;
	const pr = T[r];
	const p = pr[col];
	const width = pr.length;
	for (let j = 0; j < width; j++) pr[j] /= p;
	rhs[r] /= p;
	for (let i = 0; i < T.length; i++) {
		if (i === r) continue;
		const row = T[i];
		const f = row[col];
		if (f === 0) continue;
		for (let j = 0; j < width; j++) row[j] -= f * pr[j];
		rhs[i] -= f * rhs[r];
	}
	lp.inBasis[lp.basis[r]] = false;
	lp.inBasis[col] = true;
	lp.basis[r] = col;
}

/** Simplex iterations; phase 1 prices artificials at 1, phase 2 prices column d + j at h_j. */
export function iterate(lp: LinearProgram, phase: 1 | 2): boolean {
	const { T, rhs, basis, inBasis, d, h } = lp;
	const cols = T[0].length;
	const cb = new Array<number>(d);
	// Columns priced just below zero by rounding with no pivot entry: skipped, not "unbounded".
	const skip = new Set<number>();
	let degenerate = 0;
	for (let iter = 0; iter < 50 * cols + 100; iter++) {
		for (let i = 0; i < d; i++)
			cb[i] = phase === 1 ? (basis[i] < d ? 1 : 0) : basis[i] < d ? 0 : h[basis[i] - d];
		const bland = degenerate > 2 * d;
		let enter = -1;
		let best = -PRICE_TOL;
		for (let j = phase === 1 ? 0 : d; j < cols; j++) {
			if (inBasis[j] || skip.has(j)) continue;
			let r = phase === 1 ? (j < d ? 1 : 0) : h[j - d];
			for (let i = 0; i < d; i++) r -= cb[i] * T[i][j];
			if (r < best) {
				enter = j;
				best = r;
				if (bland) break;
			}
		}
		if (enter < 0) return true;
		let leave = -1;
		let ratio = Infinity;
		for (let i = 0; i < d; i++) {
			const a = T[i][enter];
			// An artificial left in the basis at zero must stay at zero: it leaves first, whatever
			// the sign of its entry, or the dual's equations would quietly stop holding.
			if (phase === 2 && basis[i] < d && Math.abs(a) > PIVOT_TOL) {
				rhs[i] = 0;
				ratio = 0;
				leave = i;
				break;
			}
			if (a <= PIVOT_TOL) continue;
			const q = rhs[i] / a;
			if (q < ratio - 1e-15 || (q <= ratio + 1e-15 && leave >= 0 && basis[i] < basis[leave])) {
				ratio = q;
				leave = i;
			}
		}
		if (leave < 0) {
			if (best > -1e-9) {
				skip.add(enter);
				continue;
			}
			return false;
		}
		degenerate = ratio <= 1e-15 ? degenerate + 1 : 0;
		pivot(lp, leave, enter);
	}
	throw new Error('invariant: simplex did not terminate');
}

/**
 * Rebuilds the tableau from the original data for the current basis: rounding in B⁻¹ grows with
 * each pivot, and near-duplicate points make it grow fast.
 */
export function reinvert(lp: LinearProgram): boolean {
	const { d, sign, G, basis, c } = lp;
	const column = (j: number) =>
		j < d ? c.map((_, i) => (i === j ? 1 : 0)) : c.map((_, i) => sign[i] * G[j - d][i]);
	const B = c.map((_, i) => basis.map((b) => column(b)[i]));
	const inverse: number[][] = [];
	for (let k = 0; k < d; k++) {
		const e = c.map((_, i) => (i === k ? 1 : 0));
		const col = solveSquare(B, e);
		if (!col) return false;
		inverse.push(col);
	}
	// inverse[k] is column k of B⁻¹.
	const width = d + G.length;
	for (let i = 0; i < d; i++) {
		const row = lp.T[i];
		for (let j = 0; j < width; j++) {
			const a = column(j);
			let s = 0;
			for (let k = 0; k < d; k++) s += inverse[k][i] * a[k];
			row[j] = s;
		}
		let r = 0;
		for (let k = 0; k < d; k++) r += inverse[k][i] * sign[k] * c[k];
		lp.rhs[i] = r;
	}
	return true;
}
