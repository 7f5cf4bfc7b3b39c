/**
 * Inputs and outcome of the design checks, in internal units.
 */
import type { SteelGrade } from '../material/types';
import type { BeamLine, Load } from '../model/types';
import type { ResolvedSection } from '../section/types';
import type { BasisFactors } from './design-basis';
import type { FactorSettings } from './en1993/factors';
import type { SectionClass } from './en1993/scope';
import type { HingeReduction } from './plastic-bending';
import type { LoadArrangement } from './load-arrangements';
import type { LateralRestraint, LoadHeight } from './restraint';
import type { CheckResult } from './types';
import type { Verdict } from './verdict';
import type { BearingLengths } from './web-check';

/** Everything the checks need (mm, N, N/mm, MPa). */
export interface DesignCheckInput {
	beam: BeamLine;
	/** One section per span. */
	sections: ResolvedSection[];
	/** One grade per span; null only for a section known by its Mp without a grade. */
	grades: (SteelGrade | null)[];
	/** Characteristic loads, self weight included. */
	loads: Load[];
	factors: FactorSettings;
	/** null: not given, the compression flange is taken as restrained throughout. */
	restraint: LateralRestraint | null;
	loadHeight: LoadHeight;
	/** null: not given, taken as 0 mm. */
	bearing: BearingLengths | null;
	/** span/limit for the temporary-load deflection (default 200) and for all loads (default 200). */
	deflectionLimit?: number;
	deflectionLimitTotal?: number;
	/** Count deflection in the verdict (default false: reported as a warning). */
	deflectionGoverning?: boolean;
	/** η of EN 1993-1-5 5.1(2) (default 1.0). */
	eta?: number;
	/** The user has confirmed an unknown or historic grade. */
	gradeConfirmed?: boolean;
}

/** The collapse result the verdict rests on (plastic route). */
export interface CollapseSummary {
	loadFactor: number | null;
	certified: boolean;
	mechanism: string | null;
	hinges: { x: number; moment: number }[];
	arrangement: string;
	reductions: HingeReduction[];
}

/** Everything the checks found. */
export interface DesignCheckOutcome {
	basis: string;
	factors: BasisFactors;
	/** Number of load arrangements tried. */
	arrangementCount: number;
	/** The arrangement that governs bending (collapse or first-hinge factor); null outside scope. */
	bendingArrangement: LoadArrangement | null;
	sectionClass: SectionClass | null;
	collapse: CollapseSummary | null;
	checks: CheckResult[];
	verdict: Verdict;
	notices: string[];
	assumptions: string[];
}
