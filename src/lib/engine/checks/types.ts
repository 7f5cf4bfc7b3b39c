/**
 * Shared shapes of the design checks and the verdict. Every number is in internal units
 * (N, mm, N·mm, N/mm²) unless its name says otherwise; conversion to kN and kNm happens in the
 * report. All values are plain data so a result can be stored or sent as it is.
 */

/** Stable identifier of a check kind. */
export type CheckId =
	| 'bending'
	| 'shear'
	| 'interaction'
	| 'ltb'
	| 'web'
	| 'deflection-temporary'
	| 'deflection-total'
	| 'existing-loads';

/**
 * How a check counts: `governing` checks decide pass or fail; `warning` checks are reported and
 * flagged, but never turn a pass into a fail.
 */
export type CheckLevel = 'governing' | 'warning';

/** One evaluated check. */
export interface CheckResult {
	id: CheckId;
	/** Plain-language name, e.g. `Shear at support B`. */
	label: string;
	/** Clause or source the check follows, e.g. `EN 1993-1-1 6.2.6`. */
	clause: string;
	level: CheckLevel;
	/** Demand over resistance at the design loads; 0 means no demand. */
	utilisation: number;
	/** Utilisation under the fixed (existing) loads alone, temporary load removed. */
	utilisationExisting?: number;
	/** utilisation ≤ 1 (a small tolerance is not applied: 1.0001 fails). */
	pass: boolean;
	/**
	 * Multiplier on the temporary load at which this check reaches utilisation 1, the other loads
	 * held at their design values; null when the temporary load does not affect the check.
	 */
	multiplierAtCapacity: number | null;
	/** Key numbers, internal units, named as in the code (vEd, vRd, mcr, chiLT, mbRd …). */
	values: Record<string, number>;
	/** Position along the beam, mm, where the check governs (when it has one). */
	x?: number;
	/** Name of the load arrangement that governs this check. */
	arrangement?: string;
	/** Short plain-text remark (which method was used, why a value was capped …). */
	note?: string;
}

/**
 * The analysis route the verdict rests on (EN 1993-1-1 5.4, 5.6 and 6.2).
 * - `plastic`: plastic collapse analysis (Class 1, restrained at and between hinges)
 * - `elastic-plastic-section`: elastic analysis, plastic section resistance (first hinge)
 * - `elastic-first-yield`: elastic analysis, elastic section resistance Wel·fy (Class 3)
 * - `outside-scope`: the tool cannot give an answer for this beam
 */
export type AnalysisRoute =
	'plastic' | 'elastic-plastic-section' | 'elastic-first-yield' | 'outside-scope';

/** Outcome of the whole check. */
export type VerdictKind = 'pass' | 'fail' | 'outside-scope';
