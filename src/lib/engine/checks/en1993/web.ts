/**
 * Resistance of an unstiffened I-section web to a transverse force applied through a flange,
 * EN 1993-1-5 section 6 (clause numbers from memory): Figure 6.1 types
 * (a) force through one flange, resisted by shear in the web (point load or interior support),
 * (b) force through one flange, passed through the web to the other flange (a point load directly
 *     over a support),
 * (c) force through one flange next to an unstiffened end (end support).
 */

/** Load introduction type of EN 1993-1-5 Figure 6.1. */
export type WebLoadType = 'a' | 'b' | 'c';

/** Inputs of {@link computeWebResistance}; mm and N/mm². */
export interface WebResistanceInput {
	type: WebLoadType;
	/** Clear web depth between flanges hw, mm. */
	hw: number;
	tw: number;
	/** Flange width and thickness, mm. */
	bf: number;
	tf: number;
	/** Yield strength of web and flange, N/mm². */
	fyw: number;
	fyf: number;
	E: number;
	/** Stiff bearing length ss, mm (taken no longer than hw, 6.3(2) from memory). */
	ss: number;
	/** Type (c): distance from the end of the beam to the near edge of the bearing, mm. */
	c?: number;
	gammaM1: number;
}

/** Intermediate values and the resistance, N and mm. */
export interface WebResistance {
	kF: number;
	/** Fcr = 0.9·kF·E·tw³/hw, N (eq. 6.5). */
	fCr: number;
	m1: number;
	m2: number;
	/** Effective loaded length ly, mm (6.10–6.12). */
	ly: number;
	lambdaF: number;
	chiF: number;
	/** Leff = χF·ly, mm (6.2). */
	lEff: number;
	/** FRd = fyw·Leff·tw/γM1, N (6.1). */
	fRd: number;
}

/**
 * Web resistance to a transverse force, EN 1993-1-5 6.1–6.5 for an unstiffened web (a → ∞):
 * kF = 6 (a), 3.5 (b), 2 + 6(ss + c)/hw ≤ 6 (c) (eq. 6.6 from memory); m1 = fyf·bf/(fyw·tw)
 * (6.8); m2 = 0.02(hw/tf)² if λ̄F > 0.5 else 0 (6.9); λ̄F = √(ly·tw·fyw/Fcr) (6.4);
 * χF = 0.5/λ̄F ≤ 1 (6.3).
 * @example
 * computeWebResistance({ type: 'a', hw: 283, tw: 6, bf: 165, tf: 10.2, fyw: 275, fyf: 275,
 *   E: 210e3, ss: 50, gammaM1: 1 }).fRd // ≈ 270e3 N (305x165x40 UB)
 */
export function computeWebResistance(o: WebResistanceInput): WebResistance {
	const ss = Math.min(o.ss, o.hw);
	const c = o.c ?? 0;
	const kF = o.type === 'a' ? 6 : o.type === 'b' ? 3.5 : Math.min(6, 2 + (6 * (ss + c)) / o.hw);
	const fCr = (0.9 * kF * o.E * o.tw ** 3) / o.hw;
	const m1 = (o.fyf * o.bf) / (o.fyw * o.tw);
	// m2 depends on λ̄F, which depends on ly: try with m2 and fall back to 0 when λ̄F ≤ 0.5.
	const withM2 = evaluate(o, ss, c, kF, fCr, m1, 0.02 * (o.hw / o.tf) ** 2);
	return withM2.lambdaF > 0.5 ? withM2 : evaluate(o, ss, c, kF, fCr, m1, 0);
}

function evaluate(
	o: WebResistanceInput,
	ss: number,
	c: number,
	kF: number,
	fCr: number,
	m1: number,
	m2: number
): WebResistance {
	const ly = computeLoadedLength(o, ss, c, kF, m1, m2);
	const lambdaF = Math.sqrt((ly * o.tw * o.fyw) / fCr);
	const chiF = Math.min(1, 0.5 / lambdaF);
	const lEff = chiF * ly;
	return { kF, fCr, m1, m2, ly, lambdaF, chiF, lEff, fRd: (o.fyw * lEff * o.tw) / o.gammaM1 };
}

/**
 * ly for types (a) and (b): ss + 2tf(1 + √(m1 + m2)) (6.10); type (c): the smaller of
 * le + tf√(m1/2 + (le/tf)² + m2) (6.11) and le + tf√(m1 + m2) (6.12), with
 * le = kF·E·tw²/(2·fyw·hw) ≤ ss + c (6.13). All from memory.
 */
function computeLoadedLength(
	o: WebResistanceInput,
	ss: number,
	c: number,
	kF: number,
	m1: number,
	m2: number
): number {
	if (o.type !== 'c') return ss + 2 * o.tf * (1 + Math.sqrt(m1 + m2));
	const le = Math.min((kF * o.E * o.tw ** 2) / (2 * o.fyw * o.hw), ss + c);
	const ly11 = le + o.tf * Math.sqrt(m1 / 2 + (le / o.tf) ** 2 + m2);
	const ly12 = le + o.tf * Math.sqrt(m1 + m2);
	return Math.min(ly11, ly12);
}
