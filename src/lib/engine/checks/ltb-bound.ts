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
	/**
	 * Upper bound on μ of `weights` from a solved weighting; `sameInside` when the two weight
	 * every group with loads inside the segment alike (only the end moments differ).
	 */
	fromSolved(
		weights: number[],
		A: number,
		B: number,
		norm: number,
		ref: SolvedWeighting,
		sameInside: boolean
	): number;
}

/**
 * Prepares the bound for one segment: at most FAN/2 eigenvalue solves for the end moments and 2
 * per group with loads inside, each made when first needed.
 * @param parts the load groups' parts of the segment, as given to the prepared Mcr
 */
export function prepareBucklingBound(
	prepared: PreparedCriticalMoment,
	parts: LtbSegment[]
): BucklingBound {
	const L = parts[0].length;
	// Matrices and eigenvalues are made on first use: most bounds need only a few of them.
	let units: [Float64Array, Float64Array] | null = null;
	const combine = (base: Float64Array | null, a: number, b: number) => {
		units ??= [
			prepared.matrixOf({ length: L, momentStart: 1, momentEnd: 0, loads: [] }),
			prepared.matrixOf({ length: L, momentStart: 0, momentEnd: 1, loads: [] })
		];
		const [start, end] = units;
		const g = new Float64Array(start.length);
		for (let e = 0; e < g.length; e++) g[e] = (base ? base[e] : 0) + a * start[e] + b * end[e];
		return g;
	};
	const step = (2 * Math.PI) / FAN;
	// With no loads the matrix is [[0, C], [Cᵀ, 0]]: its spectrum is ±σ, so μ(−p) = μ(p) and
	// half the fan gives the rest.
	const fanMu: number[] = [];
	const muOf = (k: number) => {
		const j = k % (FAN / 2);
		if (fanMu[j] === undefined) {
			// The same for every loading of the segment: kept between runs on the same beam.
			const [mu] = prepared.remember(`fan ${FAN} ${j}`, () =>
				Float64Array.of(
					prepared.largestOfMatrix(combine(null, Math.cos(j * step), Math.sin(j * step)))
				)
			);
			fanMu[j] = Number.isNaN(mu) ? Infinity : mu;
		}
		return fanMu[j];
	};
	const det = Math.sin(step);
	const cos = Array.from({ length: FAN + 1 }, (_, k) => Math.cos(k * step));
	const sin = Array.from({ length: FAN + 1 }, (_, k) => Math.sin(k * step));
	const endTerm = (a: number, b: number) => {
		if (a === 0 && b === 0) return 0;
		let theta = Math.atan2(b, a);
		if (theta < 0) theta += 2 * Math.PI;
		const k = Math.min(FAN - 1, Math.floor(theta / step));
		const [pc, ps, qc, qs] = [cos[k], sin[k], cos[k + 1], sin[k + 1]];
		// (a, b) = α·p + β·q with α, β ≥ 0: μ(aG_A + bG_B) ≤ α·μ(p) + β·μ(q).
		const alpha = Math.max(0, (a * qs - b * qc) / det);
		const beta = Math.max(0, (b * pc - a * ps) / det);
		return (alpha > 0 ? alpha * muOf(k) : 0) + (beta > 0 ? beta * muOf(k + 1) : 0);
	};
	// Each group's own loads inside: its matrix less the straight line between its end moments;
	// μ of it (up) and of its negative (down).
	const inside: ({ up: number; down: number } | null | undefined)[] = [];
	const insideOf = (i: number) => {
		if (inside[i] !== undefined) return inside[i];
		const part = parts[i];
		if (part.loads.length === 0) return (inside[i] = null);
		// Depends on the group's loads inside only: kept between runs on the same beam.
		const [up, down] = prepared.remember(`inside ${JSON.stringify(part)}`, () => {
			const free = combine(prepared.partMatrices[i], -part.momentStart, -part.momentEnd);
			const u = prepared.largestOfMatrix(free);
			for (let e = 0; e < free.length; e++) free[e] = -free[e];
			return Float64Array.of(u, prepared.largestOfMatrix(free));
		});
		// A solve that failed (round-off sized entries) bounds nothing.
		return (inside[i] = {
			up: Number.isNaN(up) ? Infinity : up,
			down: Number.isNaN(down) ? Infinity : down
		});
	};
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
		fromSolved(weights, A, B, norm, ref, sameInside) {
			let bound = ref.mu + endTerm(A - ref.A, B - ref.B);
			for (let i = 0; !sameInside && i < parts.length; i++) {
				const dw = weights[i] - ref.weights[i];
				if (dw === 0) continue;
				const f = insideOf(i);
				if (f) bound += dw > 0 ? dw * f.up : -dw * f.down;
			}
			bound += SLACK * (norm + ref.norm);
			return Number.isNaN(bound) ? Infinity : bound;
		}
	};
}
