/**
 * Nominal flexural strength Mn of doubly symmetric I-shapes bent about the major axis,
 * AISC 360-22 F2 (compact webs and flanges) and F3 (compact webs, noncompact or slender
 * flanges), with φb = 0.90 / Ωb = 1.67 (F1). Webs that are not compact (F4, F5) are outside
 * what this file covers and come back as `supported: false`.
 *
 * Status: equations F2-1 … F2-8 and F3-1, F3-2 are from memory of the Specification (360-16
 * numbering, unchanged in 360-22 as far as recalled); tested against the Manual's Table 3-2
 * Lp, Lr, φbMp and Design Examples F.1 (see test/validation/aisc-design-examples-flexure.test.ts).
 */
import { assertFinite } from '../../model/issue';
import { classifyIShapeFlexure, computeKc, type SectionCompactness } from './compactness';
import { FLEXURE_FACTORS, type ResistanceFactors } from './resistance';

/** How lateral-torsional buckling is found for the segment. */
export type LtbDemand =
	/** The Specification's route: F2-2/F2-4 with Cb (F1-1). */
	| { method: 'cb'; Cb: number }
	/**
	 * Our choice: the elastic critical moment Mcr of the real segment (moment diagram and load
	 * height, e.g. from `checks/mcr.ts`) replaces Fcr·Sx of F2-4 through an equivalent
	 * Cb,eq = Mcr / (Fcr·Sx at Cb = 1); F2-2 and F2-3 then run with Cb,eq. The Commentary to F1
	 * allows a more exact analysis of the elastic buckling moment [from memory].
	 */
	| { method: 'mcr'; Mcr: number };

/** Inputs of {@link computeIShapeFlexure}; N, mm, MPa. */
export interface IShapeFlexureInput {
	Fy: number;
	E: number;
	/** Plastic and elastic section moduli about the major axis, mm³. */
	Zx: number;
	Sx: number;
	/** Radius of gyration about the minor axis, mm. */
	ry: number;
	/** Effective radius of gyration rts (F2-7, see {@link computeRts}), mm. */
	rts: number;
	/** Torsional constant J, mm⁴. */
	J: number;
	/** Distance between flange centroids ho = d − tf, mm. */
	ho: number;
	/** c of F2-8a: 1 for doubly symmetric I-shapes (default). */
	c?: number;
	/** Flange width and thickness, web depth h (rolled: d − 2k) and thickness, mm. */
	bf: number;
	tf: number;
	h: number;
	tw: number;
	/** Welded section: flange λr and F3-2 with kc (Table B4.1b case 11). */
	builtUp?: boolean;
	/** Laterally unbraced length of the segment, mm (0 for continuous bracing). */
	Lb: number;
	ltb: LtbDemand;
}

/** The lateral-torsional buckling branch of F2.2. */
export interface LtbBranch {
	range: 'plastic' | 'inelastic' | 'elastic';
	/** Mn of this limit state, N·mm; null when Lb ≤ Lp (the limit state does not apply). */
	Mn: number | null;
	/** Cb used: the given Cb or, on the Mcr route, Cb,eq = Mcr / Me(Cb = 1). */
	Cb: number;
	/** Elastic LTB moment Fcr·Sx with that Cb (F2-4), N·mm; null for Lb = 0. */
	Me: number | null;
	equation: 'F2-2' | 'F2-3' | 'none';
}

/** Flange local buckling, F3.2. */
export interface FlangeBranch {
	/** Mn of this limit state, N·mm; null for compact flanges (does not apply). */
	Mn: number | null;
	equation: 'F3-1' | 'F3-2' | 'none';
	/** kc of F3-2 (only for slender flanges). */
	kc?: number;
}

/** Mn with every intermediate value the report shows. */
export type IShapeFlexure =
	| {
			supported: true;
			/** Nominal flexural strength, N·mm: the least of the limit states below. */
			Mn: number;
			/** Mp = Fy·Zx (F2-1), N·mm. */
			Mp: number;
			governing: 'yielding' | 'lateral-torsional buckling' | 'flange local buckling';
			/** e.g. `AISC 360-22 F2.2 (F2-2)`. */
			clause: string;
			factors: ResistanceFactors;
			/** Limiting lengths Lp (F2-5) and Lr (F2-6), mm. */
			Lp: number;
			Lr: number;
			ltb: LtbBranch;
			flange: FlangeBranch;
			compactness: SectionCompactness;
	  }
	| { supported: false; clause: string; reason: string; compactness: SectionCompactness };

/**
 * rts² = √(Iy·Cw) / Sx (F2-7).
 * @param o.Iy mm⁴, o.Cw mm⁶, o.Sx mm³
 * @returns rts, mm
 * @example computeRts({ Iy: 28.9, Cw: 1730, Sx: 64.7 }) // ≈ 1.86 (W16x40 in inches)
 */
export function computeRts(o: { Iy: number; Cw: number; Sx: number }): number {
	return Math.sqrt(Math.sqrt(o.Iy * o.Cw) / o.Sx);
}

/**
 * Lp = 1.76·ry·√(E/Fy) (F2-5).
 * @example computeLp({ ry: 1.57, E: 29000, Fy: 50 }) // ≈ 66.5 in = 5.55 ft (W16x40)
 */
export function computeLp(o: { ry: number; E: number; Fy: number }): number {
	return 1.76 * o.ry * Math.sqrt(o.E / o.Fy);
}

type LrInput = Pick<IShapeFlexureInput, 'rts' | 'J' | 'c' | 'Sx' | 'ho' | 'E' | 'Fy'>;

/**
 * Lr = 1.95·rts·(E/0.7Fy)·√( Jc/(Sx·ho) + √((Jc/(Sx·ho))² + 6.76(0.7Fy/E)²) ) (F2-6).
 * @example // W16x40 in inches and ksi: ≈ 190.7 in = 15.9 ft
 * computeLr({ rts: 1.86, J: 0.794, Sx: 64.7, ho: 15.5, E: 29000, Fy: 50 })
 */
export function computeLr(o: LrInput): number {
	const jTerm = (o.J * (o.c ?? 1)) / (o.Sx * o.ho);
	const stress = (0.7 * o.Fy) / o.E;
	const inner = Math.sqrt(jTerm * jTerm + 6.76 * stress * stress);
	return 1.95 * o.rts * (o.E / (0.7 * o.Fy)) * Math.sqrt(jTerm + inner);
}

/**
 * Elastic LTB moment Fcr·Sx with Fcr = Cb·π²E/(Lb/rts)²·√(1 + 0.078·(Jc/(Sx·ho))·(Lb/rts)²)
 * (F2-4), N·mm.
 */
export function computeElasticLtbMoment(o: LrInput & { Lb: number; Cb: number }): number {
	const slenderness = o.Lb / o.rts;
	const jTerm = (o.J * (o.c ?? 1)) / (o.Sx * o.ho);
	const Fcr =
		((o.Cb * Math.PI ** 2 * o.E) / slenderness ** 2) *
		Math.sqrt(1 + 0.078 * jTerm * slenderness ** 2);
	return Fcr * o.Sx;
}

/** F2.2: the LTB branch for Lb against Lp and Lr. */
function computeLtbBranch(o: IShapeFlexureInput, Mp: number, Lp: number, Lr: number): LtbBranch {
	if (o.ltb.method === 'mcr' && !(o.ltb.Mcr > 0)) throw new Error('invariant: Mcr must be > 0');
	if (o.Lb <= 0) {
		const Cb = o.ltb.method === 'cb' ? o.ltb.Cb : 1;
		return { range: 'plastic', Mn: null, Cb, Me: null, equation: 'none' };
	}
	const Cb =
		o.ltb.method === 'cb' ? o.ltb.Cb : o.ltb.Mcr / computeElasticLtbMoment({ ...o, Cb: 1 });
	const Me = computeElasticLtbMoment({ ...o, Cb });
	if (o.Lb <= Lp) return { range: 'plastic', Mn: null, Cb, Me, equation: 'none' };
	if (o.Lb <= Lr) {
		const Mr = 0.7 * o.Fy * o.Sx;
		const Mn = Math.min(Mp, Cb * (Mp - ((Mp - Mr) * (o.Lb - Lp)) / (Lr - Lp)));
		return { range: 'inelastic', Mn, Cb, Me, equation: 'F2-2' };
	}
	return { range: 'elastic', Mn: Math.min(Mp, Me), Cb, Me, equation: 'F2-3' };
}

/** F3.2: compression flange local buckling of a noncompact or slender flange. */
function computeFlangeBranch(
	o: IShapeFlexureInput,
	Mp: number,
	compactness: SectionCompactness
): FlangeBranch {
	const flange = compactness.elements[0];
	if (flange.status === 'compact') return { Mn: null, equation: 'none' };
	if (flange.status === 'noncompact') {
		const share = (flange.lambda - flange.lambdaP) / (flange.lambdaR - flange.lambdaP);
		return { Mn: Mp - (Mp - 0.7 * o.Fy * o.Sx) * share, equation: 'F3-1' };
	}
	const kc = computeKc(o);
	return { Mn: (0.9 * o.E * kc * o.Sx) / flange.lambda ** 2, equation: 'F3-2', kc };
}

/**
 * Mn of a doubly symmetric I-shape with a compact web about its major axis: the least of
 * yielding (F2-1), lateral-torsional buckling (F2-2, F2-3) and, for noncompact or slender
 * flanges, compression flange local buckling (F3-1, F3-2).
 * @example
 * // W18x50, A992, Lb = 11.67 ft, Cb = 1.01 (Design Examples F.1-2): Mn ≈ 4 060 kip·in
 * computeIShapeFlexure({ ...w18x50, Fy: 344.7, E: 199948, Lb: 3556, ltb: { method: 'cb', Cb: 1.01 } })
 */
export function computeIShapeFlexure(o: IShapeFlexureInput): IShapeFlexure {
	const compactness = classifyIShapeFlexure(o);
	if (compactness.elements[1].status !== 'compact') {
		const clause =
			compactness.elements[1].status === 'noncompact' ? 'AISC 360-22 F4' : 'AISC 360-22 F5';
		const reason = 'The web is not compact for flexure: F4/F5 are not covered by this tool.';
		return { supported: false, clause, reason, compactness };
	}
	const Mp = o.Fy * o.Zx;
	const Lp = computeLp(o);
	const Lr = computeLr(o);
	const ltb = computeLtbBranch(o, Mp, Lp, Lr);
	const flange = computeFlangeBranch(o, Mp, compactness);
	let Mn = Mp;
	let governing: Extract<IShapeFlexure, { supported: true }>['governing'] = 'yielding';
	let clause = 'AISC 360-22 F2.1 (F2-1)';
	if (ltb.Mn !== null && ltb.Mn < Mn) {
		Mn = ltb.Mn;
		governing = 'lateral-torsional buckling';
		clause = `AISC 360-22 F2.2 (${ltb.equation})`;
	}
	if (flange.Mn !== null && flange.Mn < Mn) {
		Mn = flange.Mn;
		governing = 'flange local buckling';
		clause = `AISC 360-22 F3.2 (${flange.equation})`;
	}
	assertFinite(Mn, 'AISC Mn');
	return {
		supported: true,
		Mn,
		Mp,
		governing,
		clause,
		factors: FLEXURE_FACTORS,
		Lp: assertFinite(Lp, 'AISC Lp'),
		Lr: assertFinite(Lr, 'AISC Lr'),
		ltb,
		flange,
		compactness
	};
}
