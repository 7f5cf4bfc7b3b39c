import type { FlatDims, SectionProps } from './types';
import { STEEL_DENSITY } from '../units';

/**
 * Properties of a solid rectangle (flat bar or plate on edge), h along the major axis' normal.
 * It by the series approximation for a rectangle a ≥ c:
 * a·c³[1/3 − 0.21(c/a)(1 − c⁴/(12a⁴))]
 * (Roark's Formulas for Stress and Strain, Table 10.1, from memory); Iw taken as 0;
 * Avz = A (EN 1993-1-1 6.2.6(3)(h), plates and solid bars).
 * @param dims h (depth), b (width) in mm
 * @example computeFlatProperties({ h: 100, b: 10 }).Wply // 25 000 mm³ (b·h²/4)
 */
export function computeFlatProperties(dims: FlatDims): SectionProps {
	const { h, b } = dims;
	const A = b * h;
	const Iy = (b * h ** 3) / 12;
	const Iz = (h * b ** 3) / 12;
	const a = Math.max(h, b);
	const c = Math.min(h, b);
	const It = a * c ** 3 * (1 / 3 - 0.21 * (c / a) * (1 - c ** 4 / (12 * a ** 4)));
	return {
		A,
		mass: (A * STEEL_DENSITY) / 1e6,
		Iy,
		Iz,
		Wely: (b * h * h) / 6,
		Wply: (b * h * h) / 4,
		Welz: (h * b * b) / 6,
		Wplz: (h * b * b) / 4,
		It,
		Iw: 0,
		iy: h / Math.sqrt(12),
		iz: b / Math.sqrt(12),
		Avz: A,
		d: 0
	};
}
