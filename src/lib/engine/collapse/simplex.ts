/**
 * A small dense two-phase simplex for linear programs in the form
 *   maximise cᵀy  subject to  G y ≤ h  (y free),
 * solved through its dual  minimise hᵀw  subject to  Gᵀw = c, w ≥ 0.  The dual has as many
 * equations as y has components (a handful: the redundants and λ), so the tableau stays tiny
 * however many points are checked, and w is exactly the mechanism (hinge rotations). Rows can be
 * added after a solve: the old basis stays feasible for the dual, so the next solve starts warm.
 */
import { solveSquare } from './nullspace';

/** Outcome of `solveProgram`. */
export type LinearProgramResult =
	| {
			status: 'optimal';
			y: number[];
			w: number[];
			objective: number;
			/** Largest G y − h over the rows (≤ 0 up to rounding when all is well). */
			residual: number;
	  }
	| { status: 'unbounded' } /* cᵀy grows without limit (the dual has no solution) */
	| { status: 'infeasible' }; /* no y satisfies G y ≤ h (the dual is unbounded) */

/** Pivot entries smaller than this are treated as zero. */
const PIVOT_TOL = 1e-11;
/** Pricing must see constraint violations near rounding level, or the last refinement is ignored. */
const PRICE_TOL = 1e-14;

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

function pivot(lp: LinearProgram, r: number, col: number): void {
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
function iterate(lp: LinearProgram, phase: 1 | 2): boolean {
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
function reinvert(lp: LinearProgram): boolean {
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

/** Most negative reduced cost h_j − G_j·y over all rows, computed from the data. */
function findWorstRow(lp: LinearProgram, y: number[]): number {
	let worst = 0;
	for (let j = 0; j < lp.G.length; j++) {
		const g = lp.G[j];
		let r = lp.h[j];
		for (let i = 0; i < y.length; i++) r -= g[i] * y[i];
		worst = Math.min(worst, r);
	}
	return worst;
}

/** Solves (or re-solves after `addRow`) the program. */
export function solveProgram(lp: LinearProgram): LinearProgramResult {
	const { d, T, basis } = lp;
	if (lp.warm) {
		let result = solvePhaseTwo(lp);
		// Verify against the data; if rounding in the tableau hid a violated row, rebuild and go on.
		for (let k = 0; k < 3 && result.status === 'optimal' && result.residual > PRICE_TOL; k++) {
			if (!reinvert(lp)) break;
			result = solvePhaseTwo(lp);
		}
		return result;
	}
	{
		iterate(lp, 1);
		let infeasibility = 0;
		for (let i = 0; i < d; i++) if (basis[i] < d) infeasibility += lp.rhs[i];
		if (infeasibility > 1e-9) return { status: 'unbounded' };
		// Drive artificials out where a real column can replace them.
		for (let i = 0; i < d; i++) {
			if (basis[i] >= d) continue;
			for (let j = d; j < T[i].length; j++) {
				if (!lp.inBasis[j] && Math.abs(T[i][j]) > 1e-9) {
					pivot(lp, i, j);
					break;
				}
			}
		}
		lp.warm = true;
	}
	return solveProgram(lp);
}

function solvePhaseTwo(lp: LinearProgram): LinearProgramResult {
	if (!iterate(lp, 2)) return { status: 'infeasible' };
	return readSolution(lp);
}

/** Reads w and y, re-solving the basic system for accuracy. */
function readSolution(lp: LinearProgram): LinearProgramResult {
	const { T, basis, sign, d, G, h, c } = lp;
	const m = G.length;
	const w = new Array<number>(m).fill(0);
	for (let i = 0; i < d; i++) if (basis[i] >= d) w[basis[i] - d] = Math.max(0, lp.rhs[i]);
	// Simplex multipliers: yᵢ = signᵢ Σ_k h_{B_k} (B⁻¹)_{k,i}.
	let y = new Array<number>(d).fill(0);
	for (let i = 0; i < d; i++) {
		let s = 0;
		for (let k = 0; k < d; k++) if (basis[k] >= d) s += h[basis[k] - d] * T[k][i];
		y[i] = sign[i] * s;
	}
	if (basis.every((b) => b >= d)) {
		const rows = basis.map((b) => G[b - d]);
		const yExact = solveSquare(
			rows,
			basis.map((b) => h[b - d])
		);
		const transposed = c.map((_, i) => rows.map((r) => r[i]));
		const wB = solveSquare(transposed, c);
		if (yExact) y = yExact;
		if (wB) basis.forEach((b, k) => (w[b - d] = Math.max(0, wB[k])));
	}
	let objective = 0;
	for (let i = 0; i < d; i++) objective += c[i] * y[i];
	return { status: 'optimal', y, w, objective, residual: -findWorstRow(lp, y) };
}

/** Maximises cᵀy subject to G y ≤ h with y free, in one call. */
export function solveLinearProgram(G: number[][], h: number[], c: number[]): LinearProgramResult {
	const lp = createProgram(c);
	for (let j = 0; j < G.length; j++) addRow(lp, G[j], h[j]);
	return solveProgram(lp);
}
