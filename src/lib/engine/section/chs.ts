import type { ChsDims, SectionProps } from './types';
import { STEEL_DENSITY } from '../units';

/**
 * Properties of a circular hollow section (engineering reference D.4): A = π(d − t)t,
 * I = π[d⁴ − (d − 2t)⁴]/64, Wel = 2I/d, Wpl = [d³ − (d − 2t)³]/6, It = 2I, Iw = 0,
 * Avz = 2A/π (EN 1993-1-1 6.2.6(3)(g)).
 * @param dims d (outside diameter), t in mm
 * @example computeChsProperties({ d: 114.3, t: 5 }).Wply // ≈ 59.77e3 mm³ (CHS 114.3x5.0)
 */
export function computeChsProperties(dims: ChsDims): SectionProps {
	const { d, t } = dims;
	const di = d - 2 * t;
	const A = Math.PI * (d - t) * t;
	const I = (Math.PI * (d ** 4 - di ** 4)) / 64;
	const Wel = (2 * I) / d;
	const Wpl = (d ** 3 - di ** 3) / 6;
	const i = Math.sqrt(I / A);
	return {
		A,
		mass: (A * STEEL_DENSITY) / 1e6,
		Iy: I,
		Iz: I,
		Wely: Wel,
		Wply: Wpl,
		Welz: Wel,
		Wplz: Wpl,
		It: 2 * I,
		Iw: 0,
		iy: i,
		iz: i,
		Avz: (2 * A) / Math.PI,
		d: 0
	};
}
