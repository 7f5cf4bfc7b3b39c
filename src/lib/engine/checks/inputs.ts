/**
 * Inputs and outcome of the design checks, in internal units.
 */
import type { CollapseResult } from '../collapse/index';
import type { LocatedValue } from '../elastic/index';
import type { SteelGrade } from '../material/types';
import type { BeamLine, CapacitySegment, Load } from '../model/types';
import type { ResolvedSection } from '../section/types';
import type { BasisFactors } from './design-basis';
import type { FactorSettings, ReportWording } from './basis-types';
import type { SectionClass } from './basis-types';
import type { HingeReduction } from './plastic-bending';
import type { LoadArrangement } from './load-arrangements';
import type { LateralRestraint, LoadHeight } from './restraint';
import type { DesignMoments } from './design-moments';
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
	/** The governing arrangement's collapse, solved with the shear-reduced hinge moments. */
	result: CollapseResult;
	/** The hinge resistance it was solved with (Mp,Rd reduced for shear at hinges), N·mm. */
	capacity: CapacitySegment[];
}

/** Elastic effects of the unfactored (characteristic) loads; null parts have a reason. */
export interface CharacteristicEffects {
	/** Largest sagging and hogging moment, N·mm. */
	maxMoment: { maxSagging: LocatedValue | null; maxHogging: LocatedValue | null } | null;
	/** Largest deflection, mm, downward positive: all loads, the temporary loads alone, per span. */
	maxDeflection: {
		total: LocatedValue & { span: number };
		temporary: (LocatedValue & { span: number }) | null;
		spans: LocatedValue[];
	} | null;
	notAvailable: string[];
}

/** Everything the checks found. */
export interface DesignCheckOutcome {
	basis: string;
	/** The basis's words for the report (notation, section ranks, factor sentence). */
	wording: ReportWording;
	factors: BasisFactors;
	/** Number of load arrangements tried. */
	arrangementCount: number;
	/** The arrangement that governs bending (collapse or first-hinge factor); null outside scope. */
	bendingArrangement: LoadArrangement | null;
	sectionClass: SectionClass | null;
	collapse: CollapseSummary | null;
	/** Elastic design moments and their limits, on the elastic routes; null otherwise. */
	designMoments?: DesignMoments | null;
	/** Design plastic moment resistance per span, Mp times the basis's section multiplier, N·mm. */
	mpRd: number[];
	/** Unfactored elastic effects; null when the check stopped before any analysis. */
	effects: CharacteristicEffects | null;
	checks: CheckResult[];
	verdict: Verdict;
	notices: string[];
	assumptions: string[];
}
