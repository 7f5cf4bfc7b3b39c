/**
 * A design basis: the factor sets, resistances and member checks of one code. The collapse and
 * elastic solvers know nothing of codes; everything code-specific sits behind this interface so
 * a second basis (e.g. AISC 360 LRFD with ASCE 7 combinations) can be added beside `en1993`.
 */
import type {
	Combination,
	LtbResistance,
	ReducedMomentInput,
	ScopeDecision,
	ScopeInput,
	SectionClass,
	ShearAreaInput,
	WebForceInput,
	WebResistance
} from './basis-types';
import type { ResolvedSection, SectionShape } from '../section/types';

/** Factor settings after defaults, as a basis reports them. */
export interface BasisFactors {
	/** Name of the factor set used, recorded in the result. */
	set: string;
	combinations: Combination[];
	/** Resistance factors for cross-section and member checks. */
	gammaM0: number;
	gammaM1: number;
	/** Every factor by name, for the long summary. */
	table: Record<string, number>;
}

/** Everything a design basis supplies. */
export interface DesignBasis<Settings> {
	id: string;
	/** Plain name, e.g. `EN 1990 / EN 1993-1-1 (recommended values)`. */
	name: string;
	resolveFactors(settings: Settings, options: { hasImposed: boolean }): BasisFactors;
	decideRoute(input: ScopeInput): ScopeDecision;
	/** Section class for major-axis bending (null when it cannot be found, e.g. a known Mp). */
	classifySection(
		section: ResolvedSection,
		fy: number
	): { class: SectionClass | null; note?: string };
	/** Bending resistance for the route, N·mm. */
	computeBendingResistance(o: {
		Wpl: number;
		Wel: number;
		fy: number;
		gammaM0: number;
		elastic: boolean;
	}): number;
	computeShearArea(input: ShearAreaInput): number | null;
	computeShearResistance(o: { Av: number; fy: number; gammaM0: number }): number;
	checkWebSlenderness(o: { hw: number; tw: number; fy: number; eta: number }): {
		ratio: number;
		limit: number;
		needsShearBucklingCheck: boolean;
	};
	computeShearReduction(o: { vEd: number; vplRd: number }): number;
	computeReducedMomentResistance(o: ReducedMomentInput): number;
	computeLtbResistance(o: {
		shape: SectionShape;
		h: number;
		b: number;
		Wy: number;
		fy: number;
		mcr: number;
		gammaM1: number;
	}): LtbResistance & {
		/** Clause used for χLT. */
		method: string;
		curve: string;
		/** χLT by the general method as well, for comparison (equal when it is the one used). */
		chiGeneral: number;
	};
	/** Web under a transverse force, its load type chosen from where the force stands. */
	computeWebResistance(o: WebForceInput): WebResistance;
	computeStableLength(o: {
		fy: number;
		iz: number;
		h: number;
		tf: number;
		psi: number;
	}): number | null;
}
