/**
 * The design-check part of the report in output units: check rows (kN, kNm, m; bearing lengths,
 * section sizes and deflections in mm) and the route and factors behind the verdict. This is an
 * edge of the engine, so unit conversion happens here.
 */
import type { DesignCheckOutcome } from '../checks/inputs';
import type { AnalysisRoute, CheckId, CheckResult } from '../checks/types';
import { assertFinite } from '../model/issue';
import { mmToM, nmmToKNm, nToKN } from '../units';

/** Factor-set names as people read them. */
export const FACTOR_SET_WORDS: Record<string, string> = {
	'en1990-6.10': 'EN 1990 expression 6.10',
	'en1990-6.10ab': 'EN 1990 expressions 6.10a and 6.10b (the worse)',
	custom: 'own factors'
};

/** How each key number converts from internal units. */
const KEY_UNITS: Record<string, (v: number) => number> = {
	vEd: nToKN,
	vRd: nToKN,
	fEd: nToKN,
	fRd: nToKN,
	mEd: nmmToKNm,
	mcr: nmmToKNm,
	mbRd: nmmToKNm,
	myVRd: nmmToKNm,
	mRd: nmmToKNm,
	mpRd: nmmToKNm,
	from: mmToM,
	to: mmToM,
	span: mmToM
};

/** One check row as reported. */
export interface CheckRowReport {
	id: CheckId;
	label: string;
	clause: string;
	level: 'governing' | 'warning';
	utilisation: number;
	pass: boolean;
	/** Utilisation under the existing loads alone. */
	utilisationExisting: number | null;
	/** Multiplier on the temporary loads at which this check reaches 1; null when unaffected. */
	multiplier: number | null;
	/** Position, m. */
	x: number | null;
	arrangement: string | null;
	note: string | null;
	/** Key numbers: forces kN, moments kNm, positions m, lengths of bearing and deflections mm. */
	[key: string]: unknown;
}

/** Route, factors and load arrangements behind the verdict (no capacities: see the answer). */
export interface DesignCheckReport {
	basis: string;
	route: { route: AnalysisRoute; reasons: string[] };
	factorSet: string;
	factors: Record<string, number>;
	arrangementsTried: number;
	governingArrangement: string | null;
	sectionClass: number | null;
	warnings: string[];
}

/** Converts a check row to output units. */
export function reportCheckRow(c: CheckResult): CheckRowReport {
	const keys: Record<string, number> = {};
	for (const [k, v] of Object.entries(c.values)) {
		// Numbered keys (vEd1, myVRd2 …) convert like their stem.
		const convert = KEY_UNITS[k.replace(/\d+$/, '')] ?? ((n: number) => n);
		keys[k] = assertFinite(convert(v), `check ${c.id}.${k}`);
	}
	return {
		id: c.id,
		label: c.label,
		clause: c.clause,
		level: c.level,
		utilisation: assertFinite(c.utilisation, `check ${c.id} utilisation`),
		pass: c.pass,
		utilisationExisting: c.utilisationExisting ?? null,
		multiplier: c.multiplierAtCapacity,
		x: c.x === undefined ? null : mmToM(c.x),
		arrangement: c.arrangement ?? null,
		note: c.note ?? null,
		...keys
	};
}

/** The design-check part of the report. */
export function reportDesignChecks(o: DesignCheckOutcome): DesignCheckReport {
	const v = o.verdict;
	const fromCheck = o.checks.find((c) => c.id === v.governing?.id)?.arrangement ?? null;
	const governingArrangement = v.route === 'plastic' ? (o.collapse?.arrangement ?? fromCheck) : fromCheck;
	return {
		basis: o.basis,
		route: { route: v.route, reasons: v.routeReasons },
		factorSet: o.factors.set,
		factors: o.factors.table,
		arrangementsTried: o.arrangementCount,
		governingArrangement,
		sectionClass: o.sectionClass,
		warnings: v.warnings
	};
}
