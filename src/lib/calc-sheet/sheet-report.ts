/**
 * The parts of the engine's report the calc sheet prints (SI output units: m, kN, kN/m, kNm).
 * The screen holds the whole report; this guard confirms the fields are there before printing,
 * so the sheet prints the very report the screen shows.
 */
import type { CaseFile } from '$lib/engine/case';

export interface SheetReport {
	title: string;
	engineVersion: string;
	answer: {
		verdict: 'pass' | 'fail' | 'outside-scope' | null;
		message: string;
		governing: { id: string; label: string } | null;
		utilisation: number | null;
		multiplier: number | null;
		allowable: {
			load: number;
			label: string | null;
			value: number | null;
			unit: 'kN' | 'kN/m';
			direction: 'down' | 'up';
			effect: string;
		}[];
		reasons: string[];
	};
	checks: {
		id: string;
		label: string;
		clause: string;
		level: 'governing' | 'warning';
		utilisation: number;
		pass: boolean;
	}[];
	design: {
		basis: string;
		route: { route: string; reasons: string[] };
		factorSet: string;
		factors: Record<string, number>;
		governingArrangement: string | null;
	};
	collapse: {
		decides: boolean;
		loadFactor: number | null;
		certified: boolean;
		hinges: { x: number; moment: number }[];
		diagram: { x: number[]; M: number[] } | null;
		resistance: { from: number; to: number; sagging: number; hogging: number }[];
	} | null;
	designMoments?: {
		label: string;
		arrangement: string;
		x: number[];
		M: number[];
		limits: { from: number; to: number; value: number; label: string }[];
	} | null;
	capacityCurve: {
		label: string;
		points: { x: number; p: number | null; governing: string | null }[];
		min: { x: number; p: number; governing: { id: string; label: string } | null } | null;
	} | null;
	sections: { designation: string }[];
	grades: ({ name: string } | null)[];
	notices: string[];
	assumptions: string[];
	case: CaseFile;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null;

/** True when `r` carries every part of a report the sheet prints. */
export function isSheetReport(r: unknown): r is SheetReport {
	if (!isObject(r) || !isObject(r.answer) || !isObject(r.design) || !isObject(r.case)) return false;
	const beam = r.case.beam;
	return (
		typeof r.engineVersion === 'string' &&
		typeof r.design.basis === 'string' &&
		Array.isArray(r.checks) &&
		r.checks.every((c) => isObject(c) && typeof c.clause === 'string') &&
		Array.isArray(r.sections) &&
		Array.isArray(r.grades) &&
		Array.isArray(r.notices) &&
		Array.isArray(r.assumptions) &&
		isObject(beam) &&
		Array.isArray(beam.spans) &&
		Array.isArray(r.case.loads)
	);
}
