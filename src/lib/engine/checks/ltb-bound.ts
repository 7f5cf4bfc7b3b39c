/**
 * A cheap upper bound on the buckling eigenvalue μ = 1/λcr of one segment under any weighting
 * of its load groups, from one weighting already solved. The energy matrix is linear in the
 * loads, G(w) = Σ wᵢGᵢ, and the largest eigenvalue is subadditive and positively homogeneous
 * (Weyl's inequality: μ(X + Y) ≤ μ(X) + μ(Y); Golub & Van Loan, Matrix Computations, 8.1.2), so
 *   μ(w) ≤ μ(r) + μ(Σ (wᵢ − rᵢ)Gᵢ).
 * Each group's moment in the segment is the straight line between its end moments plus the free
 * moment of its own loads inside the segment (`segment-moment.ts`), so the difference splits
 * into ΔA·G_A + ΔB·G_B (unit end moments, the groups acting from outside) and one term per group
 * with loads inside: μ(ΔA·G_A + ΔB·G_B) is bounded from μ in a fan of directions (homogeneous
 * and subadditive again), each inside term by Δw·μ(Fᵢ) or |Δw|·μ(−Fᵢ). Arrangements that differ
 * only in distant spans differ only in the end moments, so the bound is close.
 */
import type { PreparedCriticalMoment } from './mcr';
import type { LtbSegment } from './segment-moment';

/** Directions of the end-moment fan; the bound is at most 1/cos(π/K) − 1 ≈ 2 % above μ there. */
const FAN = 16;
/** Relative allowance for round-off of the eigenvalue solves (they agree to about 1e-14). */
const SLACK = 1e-9;

/** A weighting already solved: its weights, end moments and largest eigenvalue. */
export interface SolvedWeighting {
	weights: number[];
	A: number;
	B: number;
	mu: number;
	/** Σ|wᵢ|·‖Gᵢ‖, a bound on the norm of its matrix (scales the round-off allowance). */
	norm: number;
}

/** Bound of {@link prepareBucklingBound}. */
export interface BucklingBound {
	/** End moments of a weighting (moment at the segment's start and end), N·mm. */
	endMoments(weights: number[]): { A: number; B: number };
	/** Σ|wᵢ|·‖Gᵢ‖ of a weighting. */
	norm(weights: number[]): number;
	/** Upper bound on μ of `weights` from a solved weighting. */
	fromSolved(weights: number[], A: number, B: number, norm: number, ref: SolvedWeighting): number;
}

/**
 * Prepares the bound for one segment: FAN/2 + 1, and 2 per group with loads inside, eigenvalue
 * solves.
 * @param parts the load groups' parts of the segment, as given to the prepared Mcr
 */
export function prepareBucklingBound(
	prepared: PreparedCriticalMoment,
	parts: LtbSegment[]
): BucklingBound {
	const L = parts[0].length;
	const unitStart = prepared.matrixOf({ length: L, momentStart: 1, momentEnd: 0, loads: [] });
	const unitEnd = prepared.matrixOf({ length: L, momentStart: 0, momentEnd: 1, loads: [] });
	const combine = (base: Float64Array | null, a: number, b: number) => {
		const g = new Float64Array(unitStart.length);
		for (let e = 0; e < g.length; e++)
			g[e] = (base ? base[e] : 0) + a * unitStart[e] + b * unitEnd[e];
		return g;
	};
	// With no loads the matrix is [[0, C], [Cᵀ, 0]]: its spectrum is ±σ, so μ(−p) = μ(p).
	const half = Array.from({ length: FAN / 2 + 1 }, (_, k) => {
		const theta = (2 * Math.PI * k) / FAN;
		const c = Math.cos(theta);
		const s = Math.sin(theta);
		const mu = prepared.largestOfMatrix(combine(null, c, s));
		return { c, s, mu: Number.isNaN(mu) ? Infinity : mu };
	});
	const fan = [...half, ...half.slice(1).map((p) => ({ c: -p.c, s: -p.s, mu: p.mu }))];
	const step = (2 * Math.PI) / FAN;
	const det = Math.sin(step);
	const endTerm = (a: number, b: number) => {
		if (a === 0 && b === 0) return 0;
		let theta = Math.atan2(b, a);
		if (theta < 0) theta += 2 * Math.PI;
		const k = Math.min(FAN - 1, Math.floor(theta / step));
		const p = fan[k];
		const q = fan[k + 1];
		// (a, b) = α·p + β·q with α, β ≥ 0: μ(aG_A + bG_B) ≤ α·μ(p) + β·μ(q).
		const alpha = (a * q.s - b * q.c) / det;
		const beta = (b * p.c - a * p.s) / det;
		return Math.max(0, alpha) * p.mu + Math.max(0, beta) * q.mu;
	};
	// Each group's own loads inside: its matrix less the straight line between its end moments.
	const inside = parts.map((part, i) => {
		if (part.loads.length === 0) return null;
		const free = combine(prepared.partMatrices[i], -part.momentStart, -part.momentEnd);
		const up = prepared.largestOfMatrix(free);
		for (let e = 0; e < free.length; e++) free[e] = -free[e];
		const down = prepared.largestOfMatrix(free);
		// A solve that failed (round-off sized entries) bounds nothing.
		return { up: Number.isNaN(up) ? Infinity : up, down: Number.isNaN(down) ? Infinity : down };
	});
	const norms = prepared.partNorms;
	return {
		endMoments(weights) {
			let A = 0;
			let B = 0;
			for (let i = 0; i < parts.length; i++) {
				A += weights[i] * parts[i].momentStart;
				B += weights[i] * parts[i].momentEnd;
			}
			return { A, B };
		},
		norm(weights) {
			let n = 0;
			for (let i = 0; i < parts.length; i++) n += Math.abs(weights[i]) * norms[i];
			return n;
		},
		fromSolved(weights, A, B, norm, ref) {
			let bound = ref.mu + endTerm(A - ref.A, B - ref.B);
			for (let i = 0; i < parts.length; i++) {
				const f = inside[i];
				const dw = weights[i] - ref.weights[i];
				if (f && dw !== 0) bound += dw > 0 ? dw * f.up : -dw * f.down;
			}
			bound += SLACK * (norm + ref.norm);
			return Number.isNaN(bound) ? Infinity : bound;
		}
	};
}
