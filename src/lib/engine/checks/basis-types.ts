/**
 * Types every design basis shares: factor settings and combinations, resistance factors, the
 * scope decision, and the inputs and readings of the resistances a basis supplies. Basis-neutral
 * code imports these from here, never from a basis folder; each basis implements them (en1993/,
 * aisc360/). Types only one basis uses live in that basis's folder.
 */
import type { SectionShape } from '../section/types';
import type { AnalysisRoute } from './types';

/** Name of a factor set as written in a case file. */
export type FactorSetName = 'en1990-6.10' | 'en1990-6.10ab' | 'asce7-lrfd' | 'asce7-asd' | 'custom';

/**
 * Factor settings as entered; missing values take the recommended ones of the basis. The names
 * are the Eurocode ones; the AISC bases read γG,sup as the dead-load factor, γQ as the live-load
 * factor and γT as the factor on the proposed temporary load (see aisc360/combinations.ts).
 */
export interface FactorSettings {
	set: FactorSetName;
	/** γG,sup, unfavourable permanent action (recommended 1.35). */
	gammaGsup?: number;
	/** γG,inf, favourable permanent action (recommended 1.00). */
	gammaGinf?: number;
	/** γQ for existing imposed load (recommended 1.5). */
	gammaQ?: number;
	/** Factor on the temporary action; defaults to γQ. */
	gammaT?: number;
	/** Reduction ξ on unfavourable permanent action in 6.10b (recommended 0.85). */
	xi?: number;
	/** ψ0 for accompanying imposed load (0.7, categories A–D). */
	psi0?: number;
	/** ψ0 for the temporary action when it accompanies (recommended 1.0, construction loads). */
	psi0T?: number;
	/** Resistance factors γM0 and γM1 (recommended 1.00 both); Eurocode basis only. */
	gammaM0?: number;
	gammaM1?: number;
	/** Factor on dead load in the dead-load-only combination (ASCE 7-22: 1.4 LRFD, 1.0 ASD). */
	gammaGAlone?: number;
}

/**
 * Multipliers that turn nominal resistances into design ones, so basis-neutral code never names
 * a code's factor: the Eurocode basis uses 1/γM0 and 1/γM1, AISC LRFD φ (φb = 0.90) and AISC ASD
 * 1/Ω (1/Ωb = 1/1.67). A basis may apply its own factor per check where its code gives one (AISC
 * φv, and the φ of each limit state of J10); these two are what the neutral code applies itself.
 */
export interface ResistanceMultipliers {
	/** On cross-section bending resistance and the plastic moment at hinges. */
	section: number;
	/** On member buckling resistance (lateral-torsional buckling) and the web under forces. */
	member: number;
}

/** One combination expression with its factors resolved. */
export interface Combination {
	/** `6.10`, `6.10a`, `6.10b` or `custom`, plus which action leads. */
	name: string;
	/** Factor on permanent action where unfavourable / favourable. */
	gammaGsup: number;
	gammaGinf: number;
	/** Factor on existing imposed load where present. */
	gammaImposed: number;
	/** Factor on the temporary action. */
	gammaTemporary: number;
	/**
	 * The permanent load takes one factor over the whole beam (no favourable value): ASCE 7
	 * gravity combinations, where 0.9D belongs to wind and seismic combinations only.
	 */
	permanentSingle?: boolean;
	/** Word for existing imposed load in arrangement names (default `imposed`, AISC `live`). */
	imposedWord?: string;
}

/**
 * Section rank for major-axis bending, basis-neutral: 1 may form plastic hinges, 2 reaches the
 * plastic moment without rotation capacity, 3 reaches first yield (or a resistance between), 4 is
 * slender (outside this tool). The Eurocode basis uses the classes of EN 1993-1-1 Table 5.2; AISC
 * maps compact to λpd (Appendix 1) → 1, compact → 2, noncompact → 3, slender → 4. Each basis names
 * the rank in its own words ({@link BasisWords.sectionRank}).
 */
export type SectionClass = 1 | 2 | 3 | 4;

/** Facts the gate decides on. */
export interface ScopeInput {
	sectionClass: SectionClass;
	/** Ductile steel; false for cast or wrought iron. */
	ductile: boolean;
	/** False while an unknown or historic grade has not been confirmed by the user. */
	gradeConfirmed: boolean;
	/** The web is too slender for the shear resistance this basis implements. */
	needsShearBucklingCheck: boolean;
	/** The plastic collapse solution was verified by statics (only read for Class 1). */
	collapseCertified: boolean;
	/**
	 * Every hinge of the mechanism sits at a lateral restraint and the segments next to it are
	 * within the basis's stable length, or the flange is restrained throughout.
	 */
	hingesRestrained: boolean;
	/** Why the hinges are not restrained enough, for the message. */
	hingeRestraintNote?: string;
	/** Further reasons found elsewhere that put the beam outside scope. */
	otherReasons?: string[];
}

/** The route and the plain reasons for it. */
export interface ScopeDecision {
	route: AnalysisRoute;
	reasons: string[];
}

/** Dimensions and area needed for the shear area, mm and mm². */
export interface ShearAreaInput {
	shape: SectionShape;
	/** Gross area, mm². */
	A: number;
	/** Depth, flange width (or hollow width), mm. */
	h: number;
	b: number;
	/** Web and flange thickness (hollow: wall thickness in both), mm. */
	tw: number;
	tf: number;
	/** Root radius, mm (0 for welded or hollow). */
	r: number;
	/** η of EN 1993-1-5 5.1(2); 1.0 is the conservative default (Eurocode basis only). */
	eta: number;
}

/** Inputs of a basis's bending resistance with shear: the member, ρ and the multipliers. */
export interface MomentWithShearInput {
	/** Plastic modulus about the bending axis, mm³. */
	Wpl: number;
	/** Web area hw·tw (all webs), mm². */
	Aw: number;
	/** Web thickness (sum over webs), mm. */
	tw: number;
	fy: number;
	/** Shear reduction of the basis ({@link DesignBasis.computeShearReduction}). */
	rho: number;
	resistance: ResistanceMultipliers;
}

/** Absolute moments of one laterally unbraced segment, N·mm. */
export interface SegmentMomentReading {
	/** Largest |M| in the segment. */
	max: number;
	/** |M| at the quarter point, the centre and the three-quarter point. */
	quarter: number;
	centre: number;
	threeQuarter: number;
}

/** What a basis reads for one segment's buckling resistance, and how it says so. */
export interface LtbReading {
	/** Design buckling resistance moment of the segment, N·mm. */
	mbRd: number;
	/** Clause the resistance follows. */
	clause: string;
	/** One sentence on the method (what replaced what, which curve or Cb). */
	note: string;
	/** Intermediate values for the row (dimensionless or internal units, named by the basis). */
	values: Record<string, number>;
}

/** Where a force stands on the web, in neutral words. */
export type WebPlace = 'span' | 'through' | 'end';

/** Inputs of a basis's web resistance where a force stands; mm and N/mm². */
export interface WebForceInput {
	/** Overall depth, clear web depth between flanges, web thickness, mm. */
	h: number;
	hw: number;
	tw: number;
	/** Flange width and thickness, root radius, mm. */
	bf: number;
	tf: number;
	r: number;
	/** Elastic section modulus about the bending axis, mm³ (My = fy·Wel). */
	Wel: number;
	/** Yield strength of web and flange, N/mm². */
	fyw: number;
	fyf: number;
	E: number;
	/** Stiff bearing length, mm. */
	ss: number;
	/** The force passes through the web to a support under the other flange. */
	throughWeb: boolean;
	/** Clear distance from the end of the stiff bearing to the nearest unstiffened end, mm. */
	endDistance: number;
	resistance: ResistanceMultipliers;
	/**
	 * Longest laterally unbraced length of either flange at the force, mm; 0 when both flanges
	 * are held against relative lateral movement there (read by AISC J10.4 only).
	 */
	unbracedLength: number;
	/** The loaded flange is in compression at the force (top flange under sagging …). */
	loadedFlangeCompressed: boolean;
}

/** A basis's web resistance at one force and the words of its row. */
export interface WebReading {
	/** Design resistance to the force, N. */
	fRd: number;
	/** Short name of what was checked, for the label, e.g. `type a` or `web local yielding`. */
	kind: string;
	place: WebPlace;
	clause: string;
	note: string;
	/** Intermediate values for the row, internal units (the stiff bearing length as `ss`). */
	values: Record<string, number>;
	/**
	 * The basis combines the force with bending at the same section where the loaded flange is
	 * compressed (EN 1993-1-5 7.2(1)); with its clause and sentence when it governs.
	 */
	bendingInteraction: { clause: string; note: string } | null;
	/**
	 * A second reading that holds instead where the design moment at the force is at least
	 * `fromMoment`, N·mm (AISC J10.4: Cr = 480 000 ksi once Mu ≥ My, 1.5Ma ≥ My on ASD).
	 */
	highMoment?: { fromMoment: number; reading: WebReading };
}

/** Clause strings and words of a basis for the rows and the report (data, so the report can read them). */
export interface BasisWords {
	/** Short name for titles, e.g. `Eurocode` or `AISC 360-22 LRFD`. */
	short: string;
	clauses: {
		plasticBending: string;
		/** Elastic analysis with the plastic (or compact) section resistance. */
		elasticPlasticSection: string;
		/** Elastic analysis with the elastic (or noncompact) section resistance. */
		elasticFirstYield: string;
		shear: string;
		/** Bending with shear; null where the basis has no such interaction for these shapes. */
		interaction: string | null;
		ltb: string;
	};
	labels: {
		plasticBending: string;
		elasticPlasticSection: string;
		elasticFirstYield: string;
	};
	/** Sentence added to the plastic bending row when hinge resistances were reduced for shear. */
	hingeShearReduction: string;
	/** The stable length next to a hinge, in the basis's own term. */
	stableLength: string;
	/** Names of the row values as this basis writes them (vEd → `Vu`, mbRd → `φbMn` …). */
	notation: Record<string, string>;
	/** Name of each section rank ({@link SectionClass}). */
	sectionRank: Record<SectionClass, string>;
	/** The factor sentence of the report's assumptions, from the resolved factor table. */
	describeFactors(table: Record<string, number>, set: string): string;
	/** The elastic modulus sentence of the assumptions (with the value in words). */
	modulus: string;
	/** Assumption on what plastic hinges need on this basis. */
	plasticAssumption: string;
	/** Notice for a section entered by its plastic moment alone. */
	knownMpNotice: string;
	/** Default deflection limits span/n: temporary load and all loads. */
	deflectionLimits: { temporary: number; total: number };
	/** Name of the deflection limit source (common practice), for the row clause. */
	deflectionSource: string;
}

/** The words of a basis a report needs, as plain data (it travels with the design outcome). */
export interface ReportWording {
	basisId: string;
	short: string;
	/** Names of the row values ({@link BasisWords.notation}). */
	notation: Record<string, string>;
	/** Name of each section rank, keyed '1' … '4'. */
	sectionRank: Record<string, string>;
	/** The factor sentence of the assumptions. */
	factors: string;
	modulus: string;
	plasticAssumption: string;
	knownMpNotice: string;
}
