/**
 * Where moments and deflections peak inside an element. Between breakpoints the shear is at most
 * quadratic (linear loads), so its roots, and with them the moment extremes, are found in closed
 * form from three readings. The deflection slope is quartic there; its roots are bracketed on a
 * fine sampling and refined by bisection.
 */
import type { Side } from './types';

/** A field that gives moment and shear at a local position. */
export interface MomentField {
	L: number;
	breakpoints: number[];
	read(s: number, side: Side): { M: number; V: number };
}

/** Local positions with their moments where M can peak: segment ends and shear zeros. */
export function listMomentCandidates(field: MomentField): { s: number; M: number }[] {
	const out: { s: number; M: number }[] = [];
	const bp = field.breakpoints;
	for (let i = 0; i + 1 < bp.length; i++) {
		const p = bp[i];
		const q = bp[i + 1];
		if (q <= p) continue;
		const a = field.read(p, 'right');
		const b = field.read(q, 'left');
		const m = field.read((p + q) / 2, 'right');
		out.push({ s: p, M: a.M }, { s: q, M: b.M });
		for (const t of solveQuadraticOnUnit(a.V, m.V, b.V)) {
			const s = p + t * (q - p);
			out.push({ s, M: field.read(s, 'right').M });
		}
	}
	if (bp.length === 1) out.push({ s: bp[0], M: field.read(bp[0], 'right').M });
	return out;
}

/** Roots in (0, 1) of the quadratic through (0, f0), (½, fm), (1, f1). */
function solveQuadraticOnUnit(f0: number, fm: number, f1: number): number[] {
	const c = f0;
	const b = -3 * f0 + 4 * fm - f1;
	const a = 2 * f0 - 4 * fm + 2 * f1;
	const scale = Math.max(Math.abs(f0), Math.abs(fm), Math.abs(f1));
	if (scale === 0) return [];
	const roots: number[] = [];
	if (Math.abs(a) <= 1e-12 * scale) {
		if (Math.abs(b) > 1e-12 * scale) roots.push(-c / b);
	} else {
		const disc = b * b - 4 * a * c;
		if (disc >= 0) {
			const r = Math.sqrt(disc);
			// Numerically stable pair of roots.
			const qq = -0.5 * (b + (b >= 0 ? r : -r));
			roots.push(qq / a);
			if (qq !== 0) roots.push(c / qq);
		}
	}
	return roots.filter((t) => t > 0 && t < 1);
}

/**
 * Position and value of the largest |f| over [0, L] for a smooth f whose derivative `df` is
 * given: ends plus every bracketed root of df on `samples` intervals, refined by bisection.
 */
export function findAbsoluteExtreme(
	f: (s: number) => number,
	df: (s: number) => number,
	L: number,
	samples = 64
): { s: number; value: number } {
	let best = { s: 0, value: f(0) };
	const consider = (s: number): void => {
		const value = f(s);
		if (Math.abs(value) > Math.abs(best.value)) best = { s, value };
	};
	consider(L);
	let s0 = 0;
	let d0 = df(0);
	for (let i = 1; i <= samples; i++) {
		const s1 = (L * i) / samples;
		const d1 = df(s1);
		if (d0 === 0) consider(s0);
		else if (d0 * d1 < 0) consider(bisectRoot(df, s0, s1, d0));
		s0 = s1;
		d0 = d1;
	}
	return best;
}

/** Root of g in [a, b] given g(a) = ga and a sign change over the interval. */
function bisectRoot(g: (s: number) => number, a: number, b: number, ga: number): number {
	let lo = a;
	let hi = b;
	let glo = ga;
	for (let k = 0; k < 80 && hi - lo > 1e-9 * Math.max(1, Math.abs(b)); k++) {
		const mid = (lo + hi) / 2;
		const gm = g(mid);
		if (gm === 0) return mid;
		if (gm * glo < 0) hi = mid;
		else {
			lo = mid;
			glo = gm;
		}
	}
	return (lo + hi) / 2;
}
