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
	'asce7-lrfd': 'ASCE 7-22 2.3.1 strength design (LRFD)',
	'asce7-asd': 'ASCE 7-22 2.4.1 allowable stress design (ASD)',
	custom: 'own factors'
};

const same = (v: number): number => v;

/**
 * Every key number a check row may carry, with its output unit and conversion from internal
 * units. A test keeps this list complete, so no N·mm or N can leak into the report.
 */
export const ROW_KEY_UNITS: Record<string, { unit: string; convert: (v: number) => number }> = {
	vEd: { unit: 'kN', convert: nToKN },
	vRd: { unit: 'kN', convert: nToKN },
	fEd: { unit: 'kN', convert: nToKN },
	fRd: { unit: 'kN', convert: nToKN },
	mEd: { unit: 'kNm', convert: nmmToKNm },
	mRd: { unit: 'kNm', convert: nmmToKNm },
	mcr: { unit: 'kNm', convert: nmmToKNm },
	mbRd: { unit: 'kNm', convert: nmmToKNm },
	myVRd: { unit: 'kNm', convert: nmmToKNm },
	from: { unit: 'm', convert: mmToM },
	to: { unit: 'm', convert: mmToM },
	span: { unit: 'm', convert: mmToM },
	deflection: { unit: 'mm', convert: same },
	// AISC flexure: nominal strength, unbraced and limiting lengths, Cb (F1-1 and the one used).
	mn: { unit: 'kNm', convert: nmmToKNm },
	lb: { unit: 'm', convert: mmToM },
	lp: { unit: 'm', convert: mmToM },
	lr: { unit: 'm', convert: mmToM },
	cb: { unit: '', convert: same },
	cbF11: { unit: '', convert: same },
	allowed: { unit: 'mm', convert: same },
	ss: { unit: 'mm', convert: same },
	c: { unit: 'mm', convert: same },
	ly: { unit: 'mm', convert: same },
	lEff: { unit: 'mm', convert: same },
	kF: { unit: '', convert: same },
	chiF: { unit: '', convert: same },
	eta1: { unit: '', convert: same },
	eta2: { unit: '', convert: same },
	rho: { unit: '', convert: same },
	chiLT: { unit: '', convert: same },
	chiLTGeneral: { unit: '', convert: same },
	lambdaLT: { unit: '', convert: same },
	loadFactor: { unit: '', convert: same }
};

/** The unit entry of a row key; numbered keys (vEd1, myVRd2 …) read like their stem. */
export function findRowKeyUnit(key: string): (typeof ROW_KEY_UNITS)[string] | undefined {
	return ROW_KEY_UNITS[key] ?? ROW_KEY_UNITS[key.replace(/\d+$/, '')];
}

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
		const convert = findRowKeyUnit(k)?.convert ?? same;
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
	const governingArrangement =
		v.route === 'plastic' ? (o.collapse?.arrangement ?? fromCheck) : fromCheck;
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
