/**
 * The elastic moment of one load group as exact cubic pieces. Between breakpoints (span ends,
 * point loads, ends of line loads) the line load is linear, so M is a cubic in the position:
 * four readings pin it down. Pieces of different groups share breakpoints, so any weighted sum
 * of groups (a load arrangement, a multiplier on the temporary loads) is a sum of coefficients,
 * and its largest |M| on a piece comes from the ends and the roots of a quadratic — no new
 * analysis and no per-load work for each factor tried.
 */
import type { ElasticResult, Side } from './types';

/** Breakpoints of every span (local s, 0…L) shared by all groups. */
export interface PieceGrid {
	nodes: number[];
	/** Per span, sorted local breakpoints including 0 and L. */
	breakpoints: number[][];
}

/** Coefficients [c0, c1, c2, c3] of M(u) = Σ c_k u^k, u from the piece's start; per span, per piece. */
export type MomentPieces = number[][][];

/** Reads M of a result at every piece and returns its cubic coefficients. */
export function fitMomentPieces(result: ElasticResult, grid: PieceGrid): MomentPieces {
	return grid.breakpoints.map((bp, e) => {
		const x0 = grid.nodes[e];
		const L = grid.nodes[e + 1] - x0;
		const read = (s: number) => {
			// Inside the span `at` must not jump to a neighbour: read the ends from inside.
			const side: Side = s >= L ? 'left' : s <= 0 ? 'right' : 'left';
			return result.at(x0 + Math.min(L, Math.max(0, s)), side).M;
		};
		const out: number[][] = [];
		for (let k = 1; k < bp.length; k++) out.push(fitCubic(read, bp[k - 1], bp[k] - bp[k - 1]));
		return out;
	});
}

/** Newton form through u = 0, h/3, 2h/3, h, expanded to monomials in u. */
export function fitCubic(read: (s: number) => number, a: number, h: number): number[] {
	const t = [0, h / 3, (2 * h) / 3, h];
	const f = t.map((u) => read(a + u));
	if (h <= 0) return [f[0], 0, 0, 0];
	const d1 = [
		(f[1] - f[0]) / (t[1] - t[0]),
		(f[2] - f[1]) / (t[2] - t[1]),
		(f[3] - f[2]) / (t[3] - t[2])
	];
	const d2 = [(d1[1] - d1[0]) / (t[2] - t[0]), (d1[2] - d1[1]) / (t[3] - t[1])];
	const d3 = (d2[1] - d2[0]) / (t[3] - t[0]);
	// f0 + d1 u + d2 u(u − t1) + d3 u(u − t1)(u − t2)
	return [f[0], d1[0] - d2[0] * t[1] + d3 * t[1] * t[2], d2[0] - d3 * (t[1] + t[2]), d3];
}

/** Σ wᵢ·piecesᵢ (groups with weight 0 are skipped). */
export function combineMomentPieces(parts: MomentPieces[], weights: number[]): MomentPieces {
	// No group at all (a beam without loads): no pieces, read as zero moment everywhere.
	if (parts.length === 0) return [];
	const base = parts[0];
	const out = base.map((span) => span.map(() => [0, 0, 0, 0]));
	parts.forEach((p, g) => {
		const w = weights[g];
		if (w === 0) return;
		p.forEach((span, e) =>
			span.forEach((c, k) => {
				const o = out[e][k];
				for (let i = 0; i < 4; i++) o[i] += w * c[i];
			})
		);
	});
	return out;
}

/**
 * Largest |M_fixed + λ·M_variable| / limit over the beam and where it occurs.
 * @param limit moment limit per span, N·mm
 */
export function measureMomentRatio(
	fixed: MomentPieces,
	variable: MomentPieces,
	lambda: number,
	grid: PieceGrid,
	limit: number[]
): { ratio: number; x: number } {
	const w = measureWithSlope(fixed, variable, lambda, grid, limit);
	return { ratio: w.ratio, x: w.x };
}

/** A piece of a missing group. */
const NO_MOMENT = [0, 0, 0, 0];

/** {@link measureMomentRatio} with d(ratio)/dλ at the worst point (no allocation per piece). */
function measureWithSlope(
	fixed: MomentPieces,
	variable: MomentPieces,
	lambda: number,
	grid: PieceGrid,
	limit: number[]
): { ratio: number; x: number; slope: number } {
	let ratio = -1;
	let x = 0;
	let slope = 0;
	for (let e = 0; e < grid.breakpoints.length; e++) {
		const bp = grid.breakpoints[e];
		const lim = limit[e];
		for (let k = 0; k + 1 < bp.length; k++) {
			const f = fixed[e]?.[k] ?? NO_MOMENT;
			const v = variable[e]?.[k] ?? NO_MOMENT;
			const c0 = f[0] + lambda * v[0];
			const c1 = f[1] + lambda * v[1];
			const c2 = f[2] + lambda * v[2];
			const c3 = f[3] + lambda * v[3];
			const h = bp[k + 1] - bp[k];
			const x0 = grid.nodes[e] + bp[k];
			// Ends, then the interior roots of the shear (same order as before: ties keep the first).
			for (let r = -2; r < 2; r++) {
				let u: number;
				if (r === -2) u = 0;
				else if (r === -1) u = h;
				else {
					u = quadraticRoot(3 * c3, 2 * c2, c1, r);
					if (!(u > 0 && u < h)) continue;
				}
				const M = c0 + u * (c1 + u * (c2 + u * c3));
				const q = Math.abs(M) / lim;
				if (q > ratio) {
					ratio = q;
					x = x0 + u;
					const mv = v[0] + u * (v[1] + u * (v[2] + u * v[3]));
					slope = (M < 0 ? -mv : mv) / lim;
				}
			}
		}
	}
	return { ratio, x, slope };
}

/**
 * Root `which` (0 or 1) of a·u² + b·u + c, as listed by the former root finder (a linear or
 * constant equation when a is negligible); NaN where there is none.
 */
export function quadraticRoot(a: number, b: number, c: number, which: number): number {
	const size = Math.abs(a) + Math.abs(b) + Math.abs(c);
	if (size === 0) return NaN;
	if (Math.abs(a) <= 1e-14 * size) return which === 0 && Math.abs(b) > 1e-14 * size ? -c / b : NaN;
	const disc = b * b - 4 * a * c;
	if (disc < 0) return NaN;
	const q = -0.5 * (b + Math.sign(b || 1) * Math.sqrt(disc));
	if (which === 0) return q / a;
	return q !== 0 ? c / q : NaN;
}

/** Largest factor tried before the variable loads are called moment-free (as limit-factor.ts). */
const FACTOR_CEILING = 1e9;

/**
 * Factor λ at which max |M_fixed + λ·M_variable| / limit first reaches 1. The ratio is convex in
 * λ (a largest absolute value of functions linear in λ), so a chord between a point below 1 and
 * one above lands below the crossing and a tangent at the point above lands above it: the
 * bracket closes in a few steps to the same 1e-13 the former plain bisection reached.
 */
export function findPieceLimitFactor(
	fixed: MomentPieces,
	variable: MomentPieces,
	grid: PieceGrid,
	limit: number[]
):
	| { status: 'reached'; factor: number; x: number }
	| { status: 'fails-under-fixed'; x: number; ratio: number }
	| { status: 'never' } {
	const ratioAt = (lambda: number) => measureWithSlope(fixed, variable, lambda, grid, limit);
	const start = ratioAt(0);
	if (start.ratio > 1) return { status: 'fails-under-fixed', x: start.x, ratio: start.ratio };
	let hi = 1;
	let above = ratioAt(hi);
	let below = start;
	while (above.ratio <= 1) {
		hi *= 2;
		if (hi > FACTOR_CEILING) return { status: 'never' };
		below = above;
		above = ratioAt(hi);
	}
	let lo = hi === 1 ? 0 : hi / 2;
	for (let k = 0; k < 200 && hi - lo > 1e-13 * hi; k++) {
		// Chord, tangent and midpoint candidates; the midpoint every third step keeps it safe.
		const chord = lo + ((1 - below.ratio) * (hi - lo)) / (above.ratio - below.ratio);
		const tangent = above.slope > 0 ? hi - (above.ratio - 1) / above.slope : NaN;
		const trials = k % 3 === 2 ? [(lo + hi) / 2] : [chord, tangent];
		let moved = false;
		for (const t of trials) {
			if (!(t > lo && t < hi)) continue;
			const r = ratioAt(t);
			if (r.ratio <= 1) [lo, below] = [t, r];
			else [hi, above] = [t, r];
			moved = true;
		}
		if (!moved) {
			const mid = (lo + hi) / 2;
			const r = ratioAt(mid);
			if (r.ratio <= 1) [lo, below] = [mid, r];
			else [hi, above] = [mid, r];
		}
	}
	return { status: 'reached', factor: lo, x: above.x };
}

/** Breakpoints of every span from the loads of all groups (local positions). */
export function buildPieceGrid(
	nodes: number[],
	loadsBySpan: { kind: string; a: number; b?: number }[][]
): PieceGrid {
	const breakpoints = loadsBySpan.map((loads, e) => {
		const L = nodes[e + 1] - nodes[e];
		const xs = new Set<number>([0, L]);
		for (const l of loads) {
			xs.add(l.a);
			if (l.kind !== 'point' && l.b !== undefined) xs.add(l.b);
		}
		// A break within round-off of another (a load a hair from a support) would make a piece
		// too short to fit a cubic on: the moment is continuous, so such breaks are merged.
		const tol = 1e-9 * L;
		const sorted = [...xs].filter((s) => s >= 0 && s <= L).sort((a, b) => a - b);
		return sorted.filter((s, i) => s === L || i === 0 || (s - sorted[i - 1] > tol && L - s > tol));
	});
	return { nodes, breakpoints };
}
