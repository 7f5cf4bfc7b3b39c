import type { HollowProcess, RhsDims, SectionProps } from './types';
import { computeSpandrelArea, computeSpandrelOffset, computeSpandrelOwnI } from './fillet';
import { STEEL_DENSITY } from '../units';

/**
 * Corner radii of a rectangular hollow section, mm.
 * Hot-finished, EN 10210-2 basis for calculation: ro = 1.5t, ri = 1.0t (engineering reference D.4).
 * Cold-formed, EN 10219-2 (from memory of the standard's calculation radii): ro = 2t for
 * t ≤ 6 mm, 2.5t for 6 < t ≤ 10 mm, 3t above; ri = ro − t.
 * @example computeRhsCornerRadii(5, 'hot') // { ro: 7.5, ri: 5 }
 */
export function computeRhsCornerRadii(
	t: number,
	process: HollowProcess
): { ro: number; ri: number } {
	if (process === 'hot') return { ro: 1.5 * t, ri: t };
	const ro = t <= 6 ? 2 * t : t <= 10 ? 2.5 * t : 3 * t;
	return { ro, ri: ro - t };
}

/** A, I and Wpl about the axis parallel to `width` of a solid rectangle with rounded corners. */
function computeRoundedRectangle(width: number, depth: number, R: number) {
	const as = computeSpandrelArea(R);
	const ys = computeSpandrelOffset(R);
	const arm = depth / 2 - ys;
	return {
		A: width * depth - 4 * as,
		I: (width * depth ** 3) / 12 - 4 * (computeSpandrelOwnI(R) + as * arm * arm),
		Wpl: (width * depth * depth) / 4 - 4 * as * arm
	};
}

/**
 * Properties of a rectangular or square hollow section with rounded corners, computed exactly as
 * the outer rounded rectangle less the inner one. It by the EN 10210-2 formula (reference D.4);
 * Iw = 0 (closed section); Avz = A·h/(b + h) per EN 1993-1-1 6.2.6(3)(f); d = h − 2ro, the
 * flat part of the web.
 * @param dims h (depth), b (width), t, ro, ri in mm
 * @example
 * computeRhsProperties({ h: 100, b: 100, t: 5, ro: 7.5, ri: 5 }).A
 * // ≈ 1873 mm² (SHS 100x100x5.0)
 */
export function computeRhsProperties(dims: RhsDims): SectionProps {
	const { h, b, t, ro, ri } = dims;
	const outerY = computeRoundedRectangle(b, h, ro);
	const innerY = computeRoundedRectangle(b - 2 * t, h - 2 * t, ri);
	const outerZ = computeRoundedRectangle(h, b, ro);
	const innerZ = computeRoundedRectangle(h - 2 * t, b - 2 * t, ri);
	const A = outerY.A - innerY.A;
	const Iy = outerY.I - innerY.I;
	const Iz = outerZ.I - innerZ.I;
	const Rc = (ro + ri) / 2;
	const hm = 2 * (b - t + (h - t)) - 2 * Rc * (4 - Math.PI);
	const Am = (b - t) * (h - t) - Rc * Rc * (4 - Math.PI);
	const K = (2 * Am * t) / hm;
	return {
		A,
		mass: (A * STEEL_DENSITY) / 1e6,
		Iy,
		Iz,
		Wely: (2 * Iy) / h,
		Wply: outerY.Wpl - innerY.Wpl,
		Welz: (2 * Iz) / b,
		Wplz: outerZ.Wpl - innerZ.Wpl,
		It: (t ** 3 * hm) / 3 + 2 * K * Am,
		Iw: 0,
		iy: Math.sqrt(Iy / A),
		iz: Math.sqrt(Iz / A),
		Avz: (A * h) / (b + h),
		d: h - 2 * ro
	};
}
