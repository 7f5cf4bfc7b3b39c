import type { InputIssue } from '$lib/engine/model/issue';

/**
 * The parts of the engine's report the screens read (SI output units: m, kN, kN/m, kNm, mm).
 * Declared here so the screens depend only on what they show; the engine's own report type must
 * stay assignable to it (checked where the engine is called).
 */
export interface ReportView {
	/** The governing answer: read first, shown first. */
	answer: {
		verdict: 'pass' | 'fail' | 'outside-scope' | null;
		message: string;
		governing: { id: string; label: string } | null;
		multiplier: number | null;
		reserve: number | null;
		utilisation: number | null;
		allowable: {
			load: number;
			label: string | null;
			kind: string;
			entered: number;
			value: number | null;
			unit: 'kN' | 'kN/m';
			direction: 'down' | 'up';
			effect: string;
		}[];
		reasons: string[];
	};
	/** Plastic collapse in bending: a partial result, shown as the answer only where it decides. */
	collapse: {
		decides: boolean;
		status: string;
		loadFactor: number | null;
		certified: boolean;
		hinges: { x: number; moment: number }[];
		mechanism: { name: string } | null;
		diagram: { x: number[]; M: number[] } | null;
		resistance: { from: number; to: number; sagging: number; hogging: number }[];
		message: string | null;
	} | null;
	/** Elastic design moments (kNm, x m) and their limits, where the elastic route decides. */
	designMoments: {
		arrangement: string;
		x: number[];
		M: number[];
		limits: { from: number; to: number; value: number; label: string }[];
	} | null;
	/** The governing capacity curve: x m, p kN (null where nothing limits it). */
	capacityCurve: {
		points: { x: number; p: number | null; governing: string | null }[];
		stretches: { from: number; to: number; governing: { id: string; label: string } }[];
		min: { x: number; p: number; governing: { id: string; label: string } | null } | null;
	} | null;
	/** Every member check with its utilisation (demand / resistance); empty outside scope. */
	checks: { id: string; label: string; utilisation: number; pass: boolean; level: string }[];
	summary: { short: string; long: string };
	/** Which analysis route the verdict rests on, and why. */
	design: {
		route: { route: string; reasons: string[] };
		governingArrangement?: string | null;
		/** The design basis the answer is on, in words (an AISC case is never answered on EN). */
		basis?: string;
	};
	notices: string[];
	assumptions: string[];
	engineVersion: string;
}

/** What the result panel shows: input problems, a report, or an internal failure. */
export type CheckOutcome =
	| { state: 'issues'; issues: InputIssue[] }
	| { state: 'report'; report: ReportView; warnings: InputIssue[] }
	| { state: 'error'; message: string };
