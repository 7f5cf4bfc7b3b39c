/**
 * A design basis: the factor sets, resistances, member checks and words of one code. The collapse
 * and elastic solvers know nothing of codes; everything code-specific sits behind this interface:
 * `en1993/` (EN 1990 / EN 1993-1-1 / EN 1993-1-5) and `aisc360/` (AISC 360-22 LRFD and ASD with
 * ASCE 7-22 combinations) implement it. Resistances come back as design values: nominal times the
 * basis's {@link ResistanceMultipliers} (1/γM, φ or 1/Ω), so neutral code never names a factor.
 */
import type {
	BasisWords,
	Combination,
	LtbReading,
	MomentWithShearInput,
	ResistanceMultipliers,
	ScopeDecision,
	ScopeInput,
	SectionClass,
	SegmentMomentReading,
	ShearAreaInput,
	WebForceInput,
	WebReading
} from './basis-types';
import type { SpanMember } from './member';
import type { ResolvedSection, SectionShape } from '../section/types';

/** Factor settings after defaults, as a basis reports them. */
export interface BasisFactors {
	/** Name of the factor set used, recorded in the result. */
	set: string;
	combinations: Combination[];
	/** Multipliers from nominal to design resistance for the checks the neutral code runs. */
	resistance: ResistanceMultipliers;
	/** Every factor by name, for the long summary. */
	table: Record<string, number>;
}

/** Everything a design basis supplies. */
export interface DesignBasis<Settings> {
	id: string;
	/** Plain name, e.g. `EN 1990 / EN 1993-1-1 (recommended values)`. */
	name: string;
	/** Elastic and shear moduli of steel on this basis, N/mm². */
	E: number;
	G: number;
	words: BasisWords;
	resolveFactors(settings: Settings, options: { hasImposed: boolean }): BasisFactors;
	decideRoute(input: ScopeInput): ScopeDecision;
	/** Section rank for major-axis bending (null when it cannot be found, e.g. a known Mp). */
	classifySection(
		section: ResolvedSection,
		fy: number
	): { class: SectionClass | null; note?: string };
	/** Design bending resistance of the section for the route, N·mm (no member buckling). */
	computeBendingResistance(
		o: SpanMember & { resistance: ResistanceMultipliers; elastic: boolean }
	): number;
	computeShearArea(input: ShearAreaInput): number | null;
	/** Design shear resistance of a span with shear area Av, N. */
	computeShearResistance(o: SpanMember & { Av: number; resistance: ResistanceMultipliers }): number;
	checkWebSlenderness(o: { hw: number; tw: number; fy: number; eta: number }): {
		ratio: number;
		limit: number;
		needsShearBucklingCheck: boolean;
	};
	/** ρ for bending with shear (0: no reduction), from the design shear and resistance. */
	computeShearReduction(o: { vEd: number; vplRd: number }): number;
	/** Design bending resistance reduced for shear by ρ, N·mm. */
	computeReducedMomentResistance(o: MomentWithShearInput): number;
	/** Buckling resistance of one laterally unbraced segment. */
	computeLtbResistance(
		o: SpanMember & {
			/** Section modulus the route uses (plastic or elastic), mm³. */
			Wy: number;
			/** Elastic critical moment of the segment for its moment diagram and load height, N·mm. */
			mcr: number;
			/** Unbraced length, mm. */
			length: number;
			moments: SegmentMomentReading;
			resistance: ResistanceMultipliers;
		}
	): LtbReading;
	/** Web under a transverse force, from where the force stands. */
	computeWebResistance(o: WebForceInput): WebReading;
	/** Longest unbraced segment next to a plastic hinge, mm; null when the rule does not apply. */
	computeStableLength(o: {
		shape: SectionShape;
		fy: number;
		iz: number;
		h: number;
		tf: number;
		psi: number;
	}): number | null;
}
