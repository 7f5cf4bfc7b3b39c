/**
 * The check report: plain, structured-cloneable data in output units (m, kN, kN/m, kNm; section
 * dimensions and deflections in mm; stresses in MPa). Field names are part of the command line's
 * JSON output: keep them.
 */
import type { CaseFile, ResolvedFactors } from '../case/types';
import type { CheckRowReport, DesignCheckReport } from '../checks/report-fields';
import type { VerdictKind } from '../checks/types';
import type { SectionDims, SectionProps, SectionShape } from '../section/types';

/** Which loads λ multiplies: the temporary ones, or (with no temporary load) all of them. */
export type LambdaScope = 'temporary' | 'all';

/** A plastic hinge at collapse. */
export interface HingeReport {
	/** Position, m. */
	x: number;
	/** Moment at the hinge, kNm, sagging positive. */
	moment: number;
	/** Relative rotation, largest |rotation| = 1. */
	rotation: number;
}

/** Plastic collapse result. `loadFactor` is null unless a mechanism was found. */
export interface CollapseReport {
	status: 'mechanism' | 'not-certified' | 'fails-under-fixed' | 'unbounded';
	/** Collapse load factor λ on the design loads it applies to; null when there is none. */
	loadFactor: number | null;
	appliesTo: LambdaScope;
	lowerBound: number | null;
	upperBound: number | null;
	/** True only when the static and kinematic bounds meet: only then may the result count. */
	certified: boolean;
	hinges: HingeReport[];
	mechanism: { name: string; spans: number[] } | null;
	/** Vertical reactions at collapse per node, kN, upward positive. */
	reactions: number[];
	/** Moment and shear at collapse: x in m, M in kNm, V in kN (a repeated x marks a jump). */
	diagram: { x: number[]; M: number[]; V: number[] } | null;
	/** Plain-language explanation when there is no certified mechanism. */
	message: string | null;
}

/** λ applied to one proposed temporary load, in the units it was entered in. */
export interface TemporaryLoadCapacity {
	/** Index in the case's `loads` list. */
	index: number;
	label: string | null;
	kind: 'point' | 'uniform' | 'linear';
	/** As entered (characteristic): kN for a point load, kN/m for line loads (peak for linear). */
	entered: number;
	/** Largest characteristic value with the other loads present: λ × entered. */
	capacity: number;
	unit: 'kN' | 'kN/m';
}

/** Capacity of the proposed temporary loads (characteristic values). */
export interface TemporaryCapacityReport {
	loads: TemporaryLoadCapacity[];
	/** λ × the total force of the temporary loads, kN. */
	total: number;
	/** Total force of the temporary loads as entered, kN. */
	enteredTotal: number;
}

/** Largest single temporary point load along the beam with the other loads present. */
export interface CapacityCurveReport {
	/** x in m; p the largest characteristic point load there (design value ÷ γ temporary), kN. */
	points: { x: number; p: number }[];
	min: { x: number; p: number; mechanism: string };
	certified: boolean;
}

/** An elastic load factor with where it is reached. */
export interface ElasticFactorReport {
	status: 'reached' | 'fails-under-fixed' | 'never';
	/** Factor on the loads λ applies to; null unless reached. */
	factor: number | null;
	/** Position, m; null when never reached. */
	x: number | null;
}

/** Elastic results; a null part has its reason in `notAvailable`. */
export interface ElasticReport {
	/** Under the unfactored (characteristic) loads, kNm. */
	maxMoment: {
		maxSagging: { x: number; value: number } | null;
		maxHogging: { x: number; value: number } | null;
	} | null;
	/** Under the unfactored loads, mm, downward positive: all loads, and the temporary loads alone. */
	maxDeflection: {
		total: { x: number; value: number; span: number };
		temporary: { x: number; value: number; span: number } | null;
		/** Largest per span under all loads. */
		spans: { x: number; value: number }[];
	} | null;
	/** λ at first yield (|M| = Wel·fy/γM0) on the design loads, fixed loads held. */
	firstYield: ElasticFactorReport | null;
	/** λ at the first plastic hinge (|M| = Mp,Rd). */
	firstHinge: ElasticFactorReport | null;
	/** Reasons for the parts that are null. */
	notAvailable: string[];
}

/** A section as used for one span. */
export interface SectionReport {
	designation: string;
	shape: SectionShape;
	family: string | null;
	standard: string | null;
	/** Dimensions after loss, mm; null for a known Mp. */
	dims: SectionDims | null;
	/** Properties after loss (mm, mm², mm³, mm⁴, mm⁶, kg/m); null for a known Mp. */
	props: SectionProps | null;
	/** Section loss per face, mm. */
	loss: number;
	/** EN 1993-1-1 Table 5.2 class; null when it cannot be found (known Mp). */
	class: 1 | 2 | 3 | 4 | null;
	classNote: string | null;
}

/** The grade used for one span. */
export interface GradeReport {
	id: string;
	name: string;
	/** Yield strength used, MPa (for the governing thickness). */
	fy: number;
	fu: number | null;
	standard: string;
	/** Source tag of the value. */
	source: string;
	needsConfirmation: boolean;
	note: string | null;
}

/** The whole report of one case. */
export interface CheckReport {
	title: string;
	engineVersion: string;
	units: { length: 'm'; force: 'kN'; lineLoad: 'kN/m'; moment: 'kNm'; deflection: 'mm'; section: 'mm'; stress: 'MPa' };
	/** Design plastic moment resistance per span, Wpl,y·fy/γM0 (or the given Mp/γM0), kNm. */
	mpRd: number[];
	factors: ResolvedFactors;
	collapse: CollapseReport;
	temporaryCapacity: TemporaryCapacityReport | null;
	capacityCurve: CapacityCurveReport | null;
	elastic: ElasticReport;
	/** Section of the first span; `sections` has one per span. */
	section: SectionReport;
	sections: SectionReport[];
	/** Grade of the first span (null for a known Mp without grade); `grades` has one per span. */
	grade: GradeReport | null;
	grades: (GradeReport | null)[];
	/** Self-weight line load per span, kN/m (0 where not included). */
	selfWeight: number[];
	/** Member checks (bending, shear, interaction, ltb, web, deflection), worst load arrangement each. */
	checks: CheckRowReport[];
	/** `pass`, `fail` or `outside-scope`. */
	verdict: VerdictKind;
	/** The check that limits the temporary load first; null outside scope. */
	governing: { id: string; label: string; utilisation: number } | null;
	/** (allowable multiplier − 1) × 100, %; null outside scope or when the temporary load never governs. */
	reserve: number | null;
	/** Route, reasons, factor set, load arrangements and warnings behind the verdict. */
	design: DesignCheckReport;
	/** Largest temporary loads as entered: the smallest multiplier over all governing checks. */
	allowable: TemporaryCapacityReport | null;
	/** Plain-text summaries for sharing: short (< 600 characters) and long. */
	summary: { short: string; long: string };
	/** Always starts with the engineer-of-record notice. */
	notices: string[];
	assumptions: string[];
	/** The case as read, in file units. */
	case: CaseFile;
}
