/**
 * Resistance of an unstiffened I-section web to a transverse force applied through a flange,
 * EN 1993-1-5:2006 section 6, with the load type of its Figure 6.1 chosen from where the force
 * stands:
 * (a) through one flange, resisted by shear in the web: a load in a span, or a reaction at an
 *     interior support with no load above it;
 * (b) through one flange and straight through the web to the other flange: a load standing over a
 *     support (a pair of opposing forces on both flanges at the same place);
 * (c) through one flange next to an unstiffened end: an end reaction, a load near a free
 *     cantilever tip or near a supported end.
 *
 * How near is "next to an end" is our cautious rule, not a clause: the standard draws type (c)
 * but gives no distance. Its own type (c) formulas stop depending on c once ss + c reaches 2hw/3
 * (kF at its cap of 6, Figure 6.1) and le is no longer capped by ss + c (eq. 6.13). A force is
 * taken as type (c) while c < max(hw, le6), le6 = 6·E·tw²/(2·fyw·hw) (eq. 6.13 with kF = 6),
 * which covers that whole zone with margin. The model has no end stiffeners, so every beam end
 * counts as unstiffened.
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
	/** Stiff bearing length ss, mm (taken no longer than hw, EN 1993-1-5 6.3). */
	ss: number;
	/** Type (c): clear distance from the end of the stiff bearing to the end of the member, mm. */
	c?: number;
	gammaM1: number;
}

/** Where a force stands, for {@link computeWebForceResistance}; mm and N/mm². */
export interface WebForceInput extends Omit<WebResistanceInput, 'type' | 'c'> {
	/** The force passes through the web to a support under the other flange. */
	throughWeb: boolean;
	/** Clear distance from the end of the stiff bearing to the nearest unstiffened end, mm. */
	endDistance: number;
}

/** Intermediate values and the resistance, N and mm. */
export interface WebResistance {
	type: WebLoadType;
	/** Clear distance to the end used by type (c), mm; 0 for (a) and (b). */
	c: number;
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
 * Distance from an unstiffened end within which a force is type (c): max(hw, le6), mm (our
 * cautious rule, see the file note).
 * @example typeCReach({ hw: 283, tw: 6, fyw: 275, E: 210e3 }) // ≈ 291.4 (le6 governs)
 */
export function typeCReach(o: { hw: number; tw: number; fyw: number; E: number }): number {
	const le6 = (6 * o.E * o.tw ** 2) / (2 * o.fyw * o.hw);
	return Math.max(o.hw, le6);
}

/**
 * Type and resistance of a force from where it stands. A force both over a support and near an
 * end is described by (b) and by (c); the lower resistance governs (our cautious rule).
 */
export function computeWebForceResistance(o: WebForceInput): WebResistance {
	const { throughWeb, endDistance, ...rest } = o;
	const c = Math.max(0, endDistance);
	const nearEnd = c < typeCReach({ hw: o.hw, tw: o.tw, fyw: o.fyw, E: o.E });
	const end = nearEnd ? computeWebResistance({ ...rest, type: 'c', c }) : null;
	const through = throughWeb ? computeWebResistance({ ...rest, type: 'b' }) : null;
	if (end && through) return end.fRd <= through.fRd ? end : through;
	return end ?? through ?? computeWebResistance({ ...rest, type: 'a' });
}

/**
 * Web resistance to a transverse force, EN 1993-1-5 6.2–6.5 for an unstiffened web (a → ∞):
 * kF = 6 (a), 3.5 (b), 2 + 6(ss + c)/hw ≤ 6 (c) (6.4, Figure 6.1); m1 = fyf·bf/(fyw·tw)
 * (6.8); m2 = 0.02(hw/tf)² if λ̄F > 0.5 else 0 (6.9); λ̄F = √(ly·tw·fyw/Fcr) (6.4);
 * χF = 0.5/λ̄F ≤ 1 (6.3).
 * @example
 * computeWebResistance({ type: 'a', hw: 283, tw: 6, bf: 165, tf: 10.2, fyw: 275, fyf: 275,
 *   E: 210e3, ss: 50, gammaM1: 1 }).fRd // ≈ 270e3 N (305x165x40 UB)
 */
export function computeWebResistance(o: WebResistanceInput): WebResistance {
	const ss = Math.min(o.ss, o.hw);
	const c = o.type === 'c' ? Math.max(0, o.c ?? 0) : 0;
	const kF = o.type === 'a' ? 6 : o.type === 'b' ? 3.5 : Math.min(6, 2 + (6 * (ss + c)) / o.hw);
	const fCr = (0.9 * kF * o.E * o.tw ** 3) / o.hw;
	const m1 = (o.fyf * o.bf) / (o.fyw * o.tw);
	// m2 depends on λ̄F, which depends on ly: try with m2 and fall back to 0 when λ̄F ≤ 0.5.
	const withM2 = evaluate(o, { ss, c, kF, fCr, m1, m2: 0.02 * (o.hw / o.tf) ** 2 });
	return withM2.lambdaF > 0.5 ? withM2 : evaluate(o, { ss, c, kF, fCr, m1, m2: 0 });
}

interface Trial {
	ss: number;
	c: number;
	kF: number;
	fCr: number;
	m1: number;
	m2: number;
}

function evaluate(o: WebResistanceInput, p: Trial): WebResistance {
	const ly = computeLoadedLength(o, p);
	const lambdaF = Math.sqrt((ly * o.tw * o.fyw) / p.fCr);
	const chiF = Math.min(1, 0.5 / lambdaF);
	const lEff = chiF * ly;
	const fRd = (o.fyw * lEff * o.tw) / o.gammaM1;
	const { kF, fCr, m1, m2, c } = p;
	return { type: o.type, c, kF, fCr, m1, m2, ly, lambdaF, chiF, lEff, fRd };
}

/**
 * ly = ss + 2tf(1 + √(m1 + m2)) (6.10) for all types; type (c) takes the least of that,
 * le + tf√(m1/2 + (le/tf)² + m2) (6.11) and le + tf√(m1 + m2) (6.12), with
 * le = kF·E·tw²/(2·fyw·hw) ≤ ss + c (6.13).
 */
function computeLoadedLength(o: WebResistanceInput, p: Trial): number {
	const ly10 = p.ss + 2 * o.tf * (1 + Math.sqrt(p.m1 + p.m2));
	if (o.type !== 'c') return ly10;
	const le = Math.min((p.kF * o.E * o.tw ** 2) / (2 * o.fyw * o.hw), p.ss + p.c);
	const ly11 = le + o.tf * Math.sqrt(p.m1 / 2 + (le / o.tf) ** 2 + p.m2);
	const ly12 = le + o.tf * Math.sqrt(p.m1 + p.m2);
	return Math.min(ly10, ly11, ly12);
}
