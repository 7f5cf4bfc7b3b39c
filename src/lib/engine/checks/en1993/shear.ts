/**
 * Plastic shear resistance, EN 1993-1-1 6.2.6, and the web slenderness limit beyond which shear
 * buckling (EN 1993-1-5 section 5) would have to be checked.
 */
import { computeEpsilon } from '../../material/epsilon';
import type { ShearAreaInput } from '../basis-types';
export type { ShearAreaInput } from '../basis-types';

/**
 * Shear area Av for load parallel to the web (EN 1993-1-1 6.2.6(3)):
 * rolled I/H: A − 2b·tf + (tw + 2r)·tf, not less than η·hw·tw; welded I: η·hw·tw;
 * RHS: A·h/(b + h); CHS: 2A/π; solid rectangle: A (common practice).
 * @returns Av, mm², or null for a shape whose shear area is unknown (`known-mp`)
 * @example
 * computeShearArea({ shape: 'I', A: 5130, h: 303.4, b: 165, tw: 6, tf: 10.2, r: 8.9, eta: 1 })
 * // ≈ 2006.8 mm² (305x165x40 UB)
 */
export function computeShearArea(s: ShearAreaInput): number | null {
	const hw = s.h - 2 * s.tf;
	switch (s.shape) {
		case 'I':
			return Math.max(s.A - 2 * s.b * s.tf + (s.tw + 2 * s.r) * s.tf, s.eta * hw * s.tw);
		case 'welded-I':
			return s.eta * hw * s.tw;
		case 'RHS':
			return (s.A * s.h) / (s.b + s.h);
		case 'CHS':
			return (2 * s.A) / Math.PI;
		case 'flat':
			return s.A;
		default:
			return null;
	}
}

/**
 * Vpl,Rd = Av·(fy/√3)/γM0 (EN 1993-1-1 eq. 6.18).
 * @param o.Av mm², o.fy N/mm²
 * @returns N
 * @example
 * computePlasticShearResistance({ Av: 2006.8, fy: 275, gammaM0: 1 }) // ≈ 318.6e3 N
 */
export function computePlasticShearResistance(o: {
	Av: number;
	fy: number;
	gammaM0: number;
}): number {
	return (o.Av * (o.fy / Math.sqrt(3))) / o.gammaM0;
}

/** Web slenderness against the shear-buckling limit of EN 1993-1-1 6.2.6(6). */
export interface WebSlenderness {
	/** hw/tw. */
	ratio: number;
	/** 72ε/η. */
	limit: number;
	/** True when hw/tw > 72ε/η: shear buckling would need EN 1993-1-5, outside this tool. */
	needsShearBucklingCheck: boolean;
}

/**
 * Compares hw/tw with 72ε/η, ε = √(235/fy) (EN 1993-1-1 6.2.6(6)).
 * @param o.hw clear web depth between flanges, mm; o.tw mm; o.fy N/mm² of the web
 * @example
 * checkWebSlenderness({ hw: 283, tw: 6, fy: 275, eta: 1 }).needsShearBucklingCheck // false
 */
export function checkWebSlenderness(o: {
	hw: number;
	tw: number;
	fy: number;
	eta: number;
}): WebSlenderness {
	const epsilon = computeEpsilon(o.fy);
	const ratio = o.hw / o.tw;
	const limit = (72 * epsilon) / o.eta;
	return { ratio, limit, needsShearBucklingCheck: ratio > limit };
}
