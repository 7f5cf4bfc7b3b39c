import type { SectionProps } from './types';
import { STEEL_DENSITY } from '../units';

/** What differs between I outlines (parallel or tapered flanges); the rest follows from it. */
export interface IOutlineResults {
	A: number;
	Iy: number;
	Iz: number;
	Wply: number;
	Wplz: number;
	It: number;
	Avz: number;
	/** Overall depth, flange width and (mean) flange thickness, mm. */
	h: number;
	b: number;
	tf: number;
	/** Straight depth of web between the root fillets, mm. */
	d: number;
}

/**
 * The property record of a doubly symmetric I: elastic moduli from the extreme fibres,
 * radii of gyration, and Iw = Iz(h − tf)²/4 (flanges as the warping lever arm).
 */
export function buildIProps(o: IOutlineResults): SectionProps {
	return {
		A: o.A,
		mass: (o.A * STEEL_DENSITY) / 1e6,
		Iy: o.Iy,
		Iz: o.Iz,
		Wely: (2 * o.Iy) / o.h,
		Wply: o.Wply,
		Welz: (2 * o.Iz) / o.b,
		Wplz: o.Wplz,
		It: o.It,
		Iw: (o.Iz * (o.h - o.tf) ** 2) / 4,
		iy: Math.sqrt(o.Iy / o.A),
		iz: Math.sqrt(o.Iz / o.A),
		Avz: o.Avz,
		d: o.d
	};
}
