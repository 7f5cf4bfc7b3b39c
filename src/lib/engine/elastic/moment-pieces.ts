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
function fitCubic(read: (s: number) => number, a: number, h: number): number[] {
	const t = [0, h / 3, (2 * h) / 3, h];
	const f = t.map((u) => read(a + u));
	if (h <= 0) return [f[0], 0, 0, 0];
	const d1 = [(f[1] - f[0]) / (t[1] - t[0]), (f[2] - f[1]) / (t[2] - t[1]), (f[3] - f[2]) / (t[3] - t[2])];
	const d2 = [(d1[1] - d1[0]) / (t[2] - t[0]), (d1[2] - d1[1]) / (t[3] - t[1])];
	const d3 = (d2[1] - d2[0]) / (t[3] - t[0]);
	// f0 + d1 u + d2 u(u − t1) + d3 u(u − t1)(u − t2)
	return [
		f[0],
		d1[0] - d2[0] * t[1] + d3 * t[1] * t[2],
		d2[0] - d3 * (t[1] + t[2]),
		d3
	];
}

/** Σ wᵢ·piecesᵢ (groups with weight 0 are skipped). */
export function combineMomentPieces(parts: MomentPieces[], weights: number[]): MomentPieces {
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
	let worst = { ratio: -1, x: 0 };
	const c = [0, 0, 0, 0];
	fixed.forEach((span, e) => {
		const bp = grid.breakpoints[e];
		span.forEach((f, k) => {
			const v = variable[e][k];
			for (let i = 0; i < 4; i++) c[i] = f[i] + lambda * v[i];
			const h = bp[k + 1] - bp[k];
			const consider = (u: number) => {
				const M = c[0] + u * (c[1] + u * (c[2] + u * c[3]));
				const ratio = Math.abs(M) / limit[e];
				if (ratio > worst.ratio) worst = { ratio, x: grid.nodes[e] + bp[k] + u };
			};
			consider(0);
			consider(h);
			for (const u of findQuadraticRoots(3 * c[3], 2 * c[2], c[1])) if (u > 0 && u < h) consider(u);
		});
	});
	return worst;
}

/** Real roots of a·u² + b·u + c (a linear or constant equation when a is negligible). */
function findQuadraticRoots(a: number, b: number, c: number): number[] {
	const size = Math.abs(a) + Math.abs(b) + Math.abs(c);
	if (size === 0) return [];
	if (Math.abs(a) <= 1e-14 * size) return Math.abs(b) > 1e-14 * size ? [-c / b] : [];
	const disc = b * b - 4 * a * c;
	if (disc < 0) return [];
	const q = -0.5 * (b + Math.sign(b || 1) * Math.sqrt(disc));
	const r = [q / a];
	if (q !== 0) r.push(c / q);
	return r;
}

/** Largest factor tried before the variable loads are called moment-free (as limit-factor.ts). */
const FACTOR_CEILING = 1e9;

/**
 * Factor λ at which max |M_fixed + λ·M_variable| / limit first reaches 1, by the same convex
 * bisection as `computeElasticLimitFactor`, on the pieces.
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
	const ratioAt = (lambda: number) => measureMomentRatio(fixed, variable, lambda, grid, limit);
	const start = ratioAt(0);
	if (start.ratio > 1) return { status: 'fails-under-fixed', x: start.x, ratio: start.ratio };
	let hi = 1;
	while (ratioAt(hi).ratio <= 1) {
		hi *= 2;
		if (hi > FACTOR_CEILING) return { status: 'never' };
	}
	let lo = hi === 1 ? 0 : hi / 2;
	for (let k = 0; k < 200 && hi - lo > 1e-13 * hi; k++) {
		const mid = (lo + hi) / 2;
		if (ratioAt(mid).ratio <= 1) lo = mid;
		else hi = mid;
	}
	return { status: 'reached', factor: lo, x: ratioAt(hi).x };
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
		return [...xs].filter((s) => s >= 0 && s <= L).sort((a, b) => a - b);
	});
	return { nodes, breakpoints };
}
