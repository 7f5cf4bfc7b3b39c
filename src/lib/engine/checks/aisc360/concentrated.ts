/**
 * Webs of I-shapes under a concentrated force on a flange (a load or a reaction), AISC 360-22
 * J10 without stiffeners: J10.2 web local yielding, J10.3 web crippling, J10.4 web sidesway
 * buckling and J10.5 web compression buckling (a pair of forces on both flanges).
 *
 * Status: equations and factors from memory of the Specification (360-16 numbering J10-2 …
 * J10-8, unchanged in 360-22 as far as recalled; engineering reference C.7, tagged "verify").
 * Checked here against the equations only: no published worked example was recalled.
 */
import { assertFinite } from '../../model/issue';
import { US } from '../../units';
import type { ResistanceFactors } from './resistance';

/** The nominal strength of one limit state, or `applies: false` where the clause excludes it. */
export type WebForceStrength =
	| {
			applies: true;
			/** Nominal strength Rn, N. */
			Rn: number;
			factors: ResistanceFactors;
			/** e.g. `AISC 360-22 J10.3 (J10-5a)`. */
			clause: string;
			/** The intermediate values the report shows. */
			values: Record<string, number>;
	  }
	| { applies: false; clause: string; reason: string; values: Record<string, number> };

/** Inputs of {@link computeWebLocalYielding}; mm, MPa. */
export interface WebLocalYieldingInput {
	/** Web yield stress Fyw, MPa; web thickness tw, mm. */
	Fyw: number;
	tw: number;
	/** k: outer face of the flange to the web toe of the fillet, mm. */
	k: number;
	/** Bearing length lb, mm (not less than k for end reactions — the caller's rule). */
	lb: number;
	/** Member depth d and the distance from the member end to the force, mm. */
	d: number;
	distanceFromEnd: number;
}

/**
 * J10.2 web local yielding, φ = 1.00, Ω = 1.50: distance from the end > d:
 * Rn = Fyw·tw·(5k + lb) (J10-2); otherwise Rn = Fyw·tw·(2.5k + lb) (J10-3).
 * @example // W18x50 (tw 0.355 in, kdes 0.972 in), lb = 4 in, interior, Fy 50 ksi ≈ 157.2 kips
 * computeWebLocalYielding({ Fyw: 344.7, tw: 9.02, k: 24.69, lb: 101.6, d: 457.2, distanceFromEnd: 2000 })
 */
export function computeWebLocalYielding(o: WebLocalYieldingInput): WebForceStrength {
	const interior = o.distanceFromEnd > o.d;
	const Rn = o.Fyw * o.tw * ((interior ? 5 : 2.5) * o.k + o.lb);
	return {
		applies: true,
		Rn: assertFinite(Rn, 'AISC J10.2 Rn'),
		factors: { phi: 1.0, omega: 1.5 },
		clause: `AISC 360-22 J10.2 (${interior ? 'J10-2' : 'J10-3'})`,
		values: { k: o.k, lb: o.lb, distanceFromEnd: o.distanceFromEnd }
	};
}

/** Inputs of {@link computeWebCrippling}; mm, MPa. */
export interface WebCripplingInput {
	tw: number;
	tf: number;
	d: number;
	lb: number;
	E: number;
	Fyw: number;
	distanceFromEnd: number;
	/** Qf = 1.0 for W-shapes (default). */
	Qf?: number;
}

/**
 * J10.3 web crippling, φ = 0.75, Ω = 2.00, with S = √(E·Fyw·tf/tw), r = (tw/tf)^1.5:
 * at ≥ d/2 from the end Rn = 0.80·tw²·[1 + 3(lb/d)·r]·S·Qf (J10-4); nearer the end,
 * lb/d ≤ 0.2: Rn = 0.40·tw²·[1 + 3(lb/d)·r]·S·Qf (J10-5a); lb/d > 0.2:
 * Rn = 0.40·tw²·[1 + (4lb/d − 0.2)·r]·S·Qf (J10-5b).
 * @example // W18x50, lb = 4 in at the end (lb/d = 0.22): J10-5b
 * computeWebCrippling({ tw: 9.02, tf: 14.48, d: 457.2, lb: 101.6, E: 199948, Fyw: 344.7, distanceFromEnd: 0 })
 */
export function computeWebCrippling(o: WebCripplingInput): WebForceStrength {
	const Qf = o.Qf ?? 1;
	const S = Math.sqrt((o.E * o.Fyw * o.tf) / o.tw);
	const r = (o.tw / o.tf) ** 1.5;
	const ratio = o.lb / o.d;
	let Rn: number;
	let equation: string;
	if (o.distanceFromEnd >= o.d / 2) {
		Rn = 0.8 * o.tw ** 2 * (1 + 3 * ratio * r) * S * Qf;
		equation = 'J10-4';
	} else if (ratio <= 0.2) {
		Rn = 0.4 * o.tw ** 2 * (1 + 3 * ratio * r) * S * Qf;
		equation = 'J10-5a';
	} else {
		Rn = 0.4 * o.tw ** 2 * (1 + (4 * ratio - 0.2) * r) * S * Qf;
		equation = 'J10-5b';
	}
	return {
		applies: true,
		Rn: assertFinite(Rn, 'AISC J10.3 Rn'),
		factors: { phi: 0.75, omega: 2.0 },
		clause: `AISC 360-22 J10.3 (${equation})`,
		values: { lbOverD: ratio, Qf, distanceFromEnd: o.distanceFromEnd }
	};
}

/** Cr of J10.4 in MPa: 960 000 ksi where |Mu| < My (1.5|Ma| < My on ASD), else 480 000 ksi. */
export const CR_BELOW_YIELD = 960_000 * US.ksiToMPa;
export const CR_AT_YIELD = 480_000 * US.ksiToMPa;

/** Inputs of {@link computeWebSideswayBuckling}; mm. */
export interface WebSideswayInput {
	tw: number;
	tf: number;
	/** Web depth h (rolled: clear distance between flanges less the fillets), mm. */
	h: number;
	bf: number;
	/** Largest laterally unbraced length along either flange at the force, mm. */
	Lb: number;
	/**
	 * Whether the loaded (compression) flange is restrained against rotation. `'unknown'` takes
	 * the lower of the two cases that apply: J10-7 for ρ ≤ 1.7, but J10-6 for 1.7 < ρ ≤ 2.3
	 * (assuming "free to rotate" alone would drop the check there, which is not cautious).
	 */
	compressionFlangeRestrained: boolean | 'unknown';
	/** True where the required moment at the force is below My (picks Cr). */
	momentBelowYield: boolean;
}

/**
 * J10.4 web sidesway buckling, φ = 0.85, Ω = 1.76, for a compressive force on a flange where
 * the loaded flange and the tension flange are not both held against relative lateral
 * movement at the force (the caller decides that it applies). With ρ = (h/tw)/(Lb/bf):
 * flange restrained against rotation, ρ ≤ 2.3: Rn = (Cr·tw³·tf/h²)·[1 + 0.4ρ³] (J10-6);
 * not restrained, ρ ≤ 1.7: Rn = (Cr·tw³·tf/h²)·[0.4ρ³] (J10-7); beyond those limits the limit
 * state does not apply.
 */
export function computeWebSideswayBuckling(o: WebSideswayInput): WebForceStrength {
	if (o.compressionFlangeRestrained === 'unknown') {
		const free = computeWebSideswayBuckling({ ...o, compressionFlangeRestrained: false });
		const held = computeWebSideswayBuckling({ ...o, compressionFlangeRestrained: true });
		if (!free.applies) return held;
		return held.applies && held.Rn < free.Rn ? held : free;
	}
	const rho = o.h / o.tw / (o.Lb / o.bf);
	const Cr = o.momentBelowYield ? CR_BELOW_YIELD : CR_AT_YIELD;
	const limit = o.compressionFlangeRestrained ? 2.3 : 1.7;
	const values = { rho, limit, Cr };
	if (rho > limit) {
		const reason = `(h/tw)/(Lb/bf) = ${rho.toFixed(2)} > ${limit}: web sidesway buckling does not apply.`;
		return { applies: false, clause: 'AISC 360-22 J10.4', reason, values };
	}
	const base = (Cr * o.tw ** 3 * o.tf) / o.h ** 2;
	const Rn = o.compressionFlangeRestrained ? base * (1 + 0.4 * rho ** 3) : base * 0.4 * rho ** 3;
	return {
		applies: true,
		Rn: assertFinite(Rn, 'AISC J10.4 Rn'),
		factors: { phi: 0.85, omega: 1.76 },
		clause: `AISC 360-22 J10.4 (${o.compressionFlangeRestrained ? 'J10-6' : 'J10-7'})`,
		values
	};
}

/**
 * J10.5 web compression buckling under a pair of forces on both flanges at the same section,
 * φ = 0.90, Ω = 1.67: Rn = 24·tw³·√(E·Fyw)·Qf/h (J10-8), halved when the pair is nearer the
 * member end than d/2.
 */
export function computeWebCompressionBuckling(o: {
	tw: number;
	h: number;
	d: number;
	E: number;
	Fyw: number;
	distanceFromEnd: number;
	Qf?: number;
}): WebForceStrength {
	const Qf = o.Qf ?? 1;
	const nearEnd = o.distanceFromEnd < o.d / 2;
	const Rn = ((24 * o.tw ** 3 * Math.sqrt(o.E * o.Fyw) * Qf) / o.h) * (nearEnd ? 0.5 : 1);
	return {
		applies: true,
		Rn: assertFinite(Rn, 'AISC J10.5 Rn'),
		factors: { phi: 0.9, omega: 1.67 },
		clause: `AISC 360-22 J10.5 (J10-8${nearEnd ? ', halved within d/2 of the end' : ''})`,
		values: { Qf, distanceFromEnd: o.distanceFromEnd, nearEnd: nearEnd ? 1 : 0 }
	};
}
