/**
 * Lateral-torsional buckling reduction factor χLT, EN 1993-1-1 6.3.2.2 (general case) and
 * 6.3.2.3 (rolled sections and equivalent welded), recommended values.
 */
import type { SectionShape } from '../../section/types';

/** χLT and Mb,Rd for one segment. */
export interface LtbResistance {
	lambdaBar: number;
	chiLT: number;
	/** Mb,Rd = χLT·Wy·fy/γM1, N·mm. */
	mbRd: number;
}

/** Buckling curve letter. */
export type BucklingCurve = 'a' | 'b' | 'c' | 'd';

/** Imperfection factors αLT, EN 1993-1-1 Table 6.3. */
export const IMPERFECTION_FACTORS: Record<BucklingCurve, number> = {
	a: 0.21,
	b: 0.34,
	c: 0.49,
	d: 0.76
};

/** Plateau length λ̄LT,0 and factor β of 6.3.2.3(1), recommended values (from memory). */
export const ROLLED_PLATEAU = 0.4;
export const ROLLED_BETA = 0.75;
/** Plateau of the general curves (6.3.2.2): 0.2, the start of the curves of Table 6.1. */
export const GENERAL_PLATEAU = 0.2;

/** Which clause computes χLT. */
export type LtbMethod = 'general' | 'rolled';

/**
 * Curve for a section and method: Table 6.4 (general) or Table 6.5 (rolled), by h/b.
 * Shapes other than I sections take curve d under the general method (Table 6.4).
 * @example
 * selectBucklingCurve({ shape: 'I', h: 303.4, b: 165, method: 'rolled' }) // 'b'
 */
export function selectBucklingCurve(o: {
	shape: SectionShape;
	h: number;
	b: number;
	method: LtbMethod;
}): BucklingCurve {
	const slender = o.h / o.b > 2;
	if (o.shape === 'I') {
		if (o.method === 'rolled') return slender ? 'c' : 'b';
		return slender ? 'b' : 'a';
	}
	if (o.shape === 'welded-I') return slender ? 'd' : 'c';
	return 'd';
}

/**
 * Method chosen for a shape: 6.3.2.3 for rolled and welded I sections, 6.3.2.2 otherwise.
 * (6.3.2.3 is written for rolled sections or equivalent welded sections.)
 */
export function selectLtbMethod(shape: SectionShape): LtbMethod {
	return shape === 'I' || shape === 'welded-I' ? 'rolled' : 'general';
}

/**
 * χLT by 6.3.2.2: χ = 1/(Φ + √(Φ² − λ̄²)) ≤ 1, Φ = 0.5[1 + α(λ̄ − 0.2) + λ̄²].
 * @example
 * computeChiGeneral({ lambdaBar: 1.0, alpha: 0.34 }) // ≈ 0.5970
 */
export function computeChiGeneral(o: { lambdaBar: number; alpha: number }): number {
	const l = o.lambdaBar;
	if (l <= GENERAL_PLATEAU) return 1;
	const phi = 0.5 * (1 + o.alpha * (l - GENERAL_PLATEAU) + l * l);
	return Math.min(1, 1 / (phi + Math.sqrt(phi * phi - l * l)));
}

/**
 * χLT by 6.3.2.3: χ = 1/(Φ + √(Φ² − βλ̄²)), Φ = 0.5[1 + α(λ̄ − λ̄0) + βλ̄²], χ ≤ 1 and ≤ 1/λ̄².
 * @example
 * computeChiRolled({ lambdaBar: 1.0, alpha: 0.34 }) // ≈ 0.6997
 */
export function computeChiRolled(o: { lambdaBar: number; alpha: number }): number {
	const l = o.lambdaBar;
	if (l <= ROLLED_PLATEAU) return 1;
	const b = ROLLED_BETA;
	const phi = 0.5 * (1 + o.alpha * (l - ROLLED_PLATEAU) + b * l * l);
	const chi = 1 / (phi + Math.sqrt(phi * phi - b * l * l));
	return Math.min(1, 1 / (l * l), chi);
}

/** Inputs of {@link computeLtbResistance}. */
export interface LtbResistanceInput {
	/** Section modulus Wy for the class (Wpl for Class 1–2, Wel for Class 3), mm³. */
	Wy: number;
	fy: number;
	/** Elastic critical moment of the segment, N·mm (> 0). */
	mcr: number;
	gammaM1: number;
	curve: BucklingCurve;
	method: LtbMethod;
}

/**
 * Buckling resistance moment, EN 1993-1-1 6.3.2.1: λ̄LT = √(Wy·fy/Mcr), Mb,Rd = χLT·Wy·fy/γM1.
 * The modification factor f of 6.3.2.3(2) is not used (f = 1, conservative).
 * @example
 * computeLtbResistance({ Wy: 623e3, fy: 275, mcr: 96.9e6, gammaM1: 1, curve: 'b', method: 'rolled' })
 * // mbRd ≈ 87.04e6 N·mm
 */
export function computeLtbResistance(o: LtbResistanceInput): LtbResistance {
	const lambdaBar = Math.sqrt((o.Wy * o.fy) / o.mcr);
	const alpha = IMPERFECTION_FACTORS[o.curve];
	const chiLT =
		o.method === 'rolled'
			? computeChiRolled({ lambdaBar, alpha })
			: computeChiGeneral({ lambdaBar, alpha });
	return { lambdaBar, chiLT, mbRd: (chiLT * o.Wy * o.fy) / o.gammaM1 };
}
