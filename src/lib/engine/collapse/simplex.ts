/**
 * A small dense two-phase simplex for linear programs in the form
 *   maximise cᵀy  subject to  G y ≤ h  (y free),
 * solved through its dual  minimise hᵀw  subject to  Gᵀw = c, w ≥ 0.  The dual has as many
 * equations as y has components (a handful: the redundants and λ), so the tableau stays tiny
 * however many points are checked, and w is exactly the mechanism (hinge rotations). Rows can be
 * added after a solve: the old basis stays feasible for the dual, so the next solve starts warm.
 */
import { solveSquare } from './nullspace';
import {
	addRow,
	createProgram,
	iterate,
	pivot,
	reinvert,
	type LinearProgram
} from './simplex-tableau';

export { addRow, createProgram, type LinearProgram };

/** A row violated by more than this after a solve makes the tableau be rebuilt. */
const VERIFY_TOL = 1e-12;

/** Outcome of `solveProgram`. */
export type LinearProgramResult =
	| {
			status: 'optimal';
			y: number[];
			w: number[];
			objective: number;
			/** Largest G y − h over the rows (≤ 0 up to rounding when all is well). */
			residual: number;
			/** Largest relative error of the dual equations Gᵀw = c. */
			dualError: number;
	  }
	| { status: 'unbounded' } /* cᵀy grows without limit (the dual has no solution) */
	| { status: 'infeasible' }; /* no y satisfies G y ≤ h (the dual is unbounded) */

/** Largest relative error of Gᵀw = c accepted from a re-inverted tableau. */
const DUAL_TOL = 1e-9;

/** Largest |Gᵀw − c| relative to the size of the terms. */
function measureDualError(lp: LinearProgram, w: number[]): number {
	let worst = 0;
	for (let i = 0; i < lp.d; i++) {
		let s = -lp.c[i];
		let size = Math.abs(lp.c[i]);
		for (let j = 0; j < w.length; j++) {
			if (w[j] === 0) continue;
			s += lp.G[j][i] * w[j];
			size += Math.abs(lp.G[j][i] * w[j]);
		}
		worst = Math.max(worst, Math.abs(s) / Math.max(size, 1e-300));
	}
	return worst;
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
		// Verify against the data; if rounding in the tableau hid a violated row, rebuild and go
		// on, keeping the most accurate answer (a rebuilt tableau of a near-singular basis can be
		// worse).
		let best = result;
		for (let k = 0; k < 3 && result.status === 'optimal' && result.residual > VERIFY_TOL; k++) {
			if (!reinvert(lp)) break;
			result = solvePhaseTwo(lp);
			if (result.status !== 'optimal') break;
			// A rebuilt near-singular basis can give a "solution" whose hinge rotations no longer
			// balance (Gᵀw ≠ c): its objective is then no bound at all, so it never replaces one.
			if (result.dualError > DUAL_TOL) break;
			if (best.status !== 'optimal' || result.residual < best.residual) best = result;
		}
		return best;
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
	const dualError = measureDualError(lp, w);
	return { status: 'optimal', y, w, objective, residual: -findWorstRow(lp, y), dualError };
}

/** Maximises cᵀy subject to G y ≤ h with y free, in one call. */
export function solveLinearProgram(G: number[][], h: number[], c: number[]): LinearProgramResult {
	const lp = createProgram(c);
	for (let j = 0; j < G.length; j++) addRow(lp, G[j], h[j]);
	return solveProgram(lp);
}
