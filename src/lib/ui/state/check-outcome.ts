import type { InputIssue } from '$lib/engine/model/issue';

/**
 * The parts of the engine's report the screens read (SI output units: m, kN, kN/m, kNm, mm).
 * Declared here so the screens depend only on what they show; the engine's own report type must
 * stay assignable to it (checked where the engine is called).
 */
export interface ReportView {
	/** Design plastic moment per span, kNm. */
	mpRd: number[];
	collapse: {
		status: string;
		loadFactor: number | null;
		appliesTo: 'temporary' | 'all';
		certified: boolean;
		hinges: { x: number; moment: number }[];
		mechanism: { name: string } | null;
		diagram: { x: number[]; M: number[] } | null;
		message: string | null;
	};
	/** λ × the proposed temporary loads: `total` in kN (characteristic). */
	temporaryCapacity: { total: number } | null;
	/** Largest temporary loads every check allows: `total` in kN (characteristic). */
	allowable: { total: number } | null;
	/** Largest characteristic point load by position: x m, p kN. */
	capacityCurve: { points: { x: number; p: number }[]; min: { x: number; p: number } } | null;
	/** Every member check with its utilisation (demand / resistance). */
	checks: { id: string; label: string; utilisation: number; pass: boolean; level: string }[];
	verdict: 'pass' | 'fail' | 'outside-scope';
	/** The check that limits the temporary load first; null outside scope. */
	governing: { id: string; label: string } | null;
	/** Reserve against the governing check, %. */
	reserve: number | null;
	summary: { short: string; long: string };
	/** Which analysis route the verdict rests on, and why. */
	design: { route: { route: string; reasons: string[] }; governingArrangement?: string | null };
	notices: string[];
	assumptions: string[];
	engineVersion: string;
}

/** What the result panel shows: input problems, a report, or an internal failure. */
export type CheckOutcome =
	| { state: 'issues'; issues: InputIssue[] }
	| { state: 'report'; report: ReportView; warnings: InputIssue[] }
	| { state: 'error'; message: string };
