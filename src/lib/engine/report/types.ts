/**
 * The check report: plain, structured-cloneable data in output units (m, kN, kN/m, kNm; section
 * dimensions and deflections in mm; stresses in MPa). Field names are part of the command line's
 * JSON output: keep them.
 */
import type { CaseFile, ResolvedFactors } from '../case/types';
import type { CheckRowReport, DesignCheckReport } from './check-rows';
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

/** What one proposed temporary load may grow to, in the units it was entered in. */
export interface AllowableLoadReport {
	/** Index in the case's `loads` list (0-based; "load 1" is index 0). */
	load: number;
	label: string | null;
	kind: 'point' | 'uniform' | 'linear';
	/** As entered, signed, downward positive: kN for a point load, kN/m (peak) for a line load. */
	entered: number;
	/** Largest size every deciding check allows, in `unit`, as a magnitude; null when unlimited. */
	value: number | null;
	unit: 'kN' | 'kN/m';
	direction: 'down' | 'up';
	/** `limited`, `relieves` (acts upward, nothing limits it) or `not-limited`. */
	effect: 'limited' | 'relieves' | 'not-limited';
}

/**
 * The governing answer: the first thing to read. Every capacity in the report that is not here
 * is a partial result and says so.
 */
export interface AnswerReport {
	/** `pass`, `fail`, `outside-scope`, or null when no non-zero proposed load was entered. */
	verdict: VerdictKind | null;
	/** One plain sentence saying what the verdict means. */
	message: string;
	/** The check that limits the proposed loads first; null outside scope. */
	governing: { id: string; label: string } | null;
	/** Largest factor on the proposed temporary loads that every deciding check allows. */
	multiplier: number | null;
	/** multiplier − 1 (0.25 means 25 % more than proposed). */
	reserve: number | null;
	/** Utilisation of the governing check at the loads as entered. */
	utilisation: number | null;
	/** One entry per proposed temporary load. */
	allowable: AllowableLoadReport[];
	/** Why the beam is outside scope and what would bring it in; empty otherwise. */
	reasons: string[];
}

/**
 * Plastic collapse in bending alone, solved with the shear-reduced hinge moments the bending
 * check uses. A partial result: it is the answer only when `decides` is true and bending governs.
 */
export interface CollapseReport {
	label: 'plastic collapse in bending';
	/** True when the verdict rests on the plastic route (else shown for information only). */
	decides: boolean;
	status: 'mechanism' | 'not-certified' | 'fails-under-fixed' | 'unbounded';
	/** Collapse load factor λ on the proposed temporary loads; null when there is none. */
	loadFactor: number | null;
	appliesTo: LambdaScope;
	lowerBound: number | null;
	upperBound: number | null;
	/** True only when the static and kinematic bounds meet: only then may the result count. */
	certified: boolean;
	/** The load arrangement it is for (the one that governs bending). */
	arrangement: string;
	hinges: HingeReport[];
	mechanism: { name: string; spans: number[] } | null;
	/** Vertical reactions at collapse per node, kN, upward positive. */
	reactions: number[];
	/** Moment and shear at collapse: x in m, M in kNm, V in kN (a repeated x marks a jump). */
	diagram: { x: number[]; M: number[]; V: number[] } | null;
	/** Hinge resistance at each end of the beam's capacity segments, kNm (after shear reduction). */
	resistance: { from: number; to: number; sagging: number; hogging: number }[];
	/** Plain-language explanation when there is no certified mechanism. */
	message: string | null;
}

/**
 * The governing capacity curve: the largest single proposed point load at each position, with
 * the existing loads present and the other proposed loads removed, over every deciding check.
 */
export interface CapacityCurveReport {
	label: string;
	/** x in m; p in kN (characteristic), null where nothing limits it or it is outside scope. */
	points: { x: number; p: number | null; governing: string | null; outsideScope: boolean }[];
	/** Stretches of the beam where one check governs: from and to in m. */
	stretches: { from: number; to: number; governing: { id: string; label: string } }[];
	/** The least value along the beam and the check that governs there. */
	min: { x: number; p: number; governing: { id: string; label: string } | null } | null;
}

/**
 * The elastic design moments the elastic route rests on (governing arrangement, design loads as
 * entered) and the resistance each stretch is checked against: x, from, to in m; M, value in kNm.
 */
export interface DesignMomentsReport {
	label: string;
	arrangement: string;
	x: number[];
	M: number[];
	limits: { from: number; to: number; value: number; label: string }[];
}

/** Elastic action effects under the unfactored (characteristic) loads; null parts say why. */
export interface EffectsReport {
	/** kNm, x in m. */
	maxMoment: {
		maxSagging: { x: number; value: number } | null;
		maxHogging: { x: number; value: number } | null;
	} | null;
	/** mm, downward positive, x in m: all loads, and the temporary loads alone. */
	maxDeflection: {
		total: { x: number; value: number; span: number };
		temporary: { x: number; value: number; span: number } | null;
		spans: { x: number; value: number }[];
	} | null;
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
	/**
	 * Section rank for bending (EN 1993-1-1 Table 5.2 class on the Eurocode basis; on AISC 1 compact
	 * to λpd, 2 compact, 3 noncompact, 4 slender); null when it cannot be found (known Mp).
	 */
	class: 1 | 2 | 3 | 4 | null;
	/** The rank in the basis's words (`Class 2`, `compact` …); null with the class. */
	classWords: string | null;
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

/** Format tag and version of the report (see src/lib/engine/README.md, "The report"). */
export const REPORT_FORMAT = 'hingepoint.report';
export const REPORT_VERSION = 2;

/** The whole report of one case. */
export interface CheckReport {
	format: typeof REPORT_FORMAT;
	version: typeof REPORT_VERSION;
	title: string;
	engineVersion: string;
	/** Units of the report's words (summaries, notices, notes, names); its numbers are in `units`. */
	textUnits: 'si' | 'us';
	units: {
		length: 'm';
		force: 'kN';
		lineLoad: 'kN/m';
		moment: 'kNm';
		deflection: 'mm';
		section: 'mm';
		stress: 'MPa';
	};
	/** The governing answer. Read this first. */
	answer: AnswerReport;
	/** Member checks, worst load arrangement each; empty outside scope. */
	checks: CheckRowReport[];
	/** Route, reasons, factor set, load arrangements and warnings behind the verdict. */
	design: DesignCheckReport;
	/** Plastic collapse in bending (partial result); null outside scope or off the plastic path. */
	collapse: CollapseReport | null;
	/** Elastic design moments and their limits, on the elastic routes; null otherwise. */
	designMoments: DesignMomentsReport | null;
	/** The governing capacity curve, when asked for; null outside scope. */
	capacityCurve: CapacityCurveReport | null;
	/** Elastic moments and deflections under the unfactored loads (action effects). */
	effects: EffectsReport;
	factors: ResolvedFactors;
	sections: SectionReport[];
	/** One per span (null for a known Mp without grade). */
	grades: (GradeReport | null)[];
	/** Self-weight line load per span, kN/m (0 where not included). */
	selfWeight: number[];
	/** Plain-text summaries for sharing: short (< 600 characters) and long. */
	summary: { short: string; long: string };
	/** Always starts with the engineer-of-record notice. */
	notices: string[];
	assumptions: string[];
	/** The case as read, in file units. */
	case: CaseFile;
}
