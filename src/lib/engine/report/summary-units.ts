/**
 * Units of the share texts: SI (m, kN, kN/m, kNm, mm) or US customary (ft, kip, kip/ft, kip·ft,
 * in). Numbers arrive in the report's SI output units; the report's JSON itself stays SI.
 */
import { US } from '../units';

/** The unit system the share texts are written in. */
export type SummaryUnits = 'si' | 'us';

/** The kinds of quantity the share texts print. `small` is section sizes and deflections. */
export type SummaryQuantity = 'length' | 'force' | 'lineLoad' | 'moment' | 'small' | 'stress';

const kip = US.kipToKN;
const ft = US.ftToM;

/** Per quantity: how many SI output units one shown unit is, and its symbol. */
const SHOWN: Record<SummaryUnits, Record<SummaryQuantity, [toSI: number, symbol: string]>> = {
	si: {
		length: [1, 'm'],
		force: [1, 'kN'],
		lineLoad: [1, 'kN/m'],
		moment: [1, 'kNm'],
		small: [1, 'mm'],
		stress: [1, 'MPa']
	},
	us: {
		length: [ft, 'ft'],
		force: [kip, 'kip'],
		lineLoad: [kip / ft, 'kip/ft'],
		moment: [kip * ft, 'kip·ft'],
		small: [US.inToMm, 'in'],
		stress: [US.ksiToMPa, 'ksi']
	}
};

/** The unit system in words, for the long text. */
export const UNITS_WORDS: Record<SummaryUnits, string> = {
	si: 'SI (m, kN, kN/m, kNm, mm)',
	us: 'US customary (ft, kip, kip/ft, kip·ft, in)'
};

/** Rounds to 3 significant figures, plain notation; below 1e-9 in size it is 0. */
export function formatNumber(v: number): string {
	if (!Number.isFinite(v)) throw new Error('invariant: summary numbers are finite');
	// Round-off left over where a value is zero (a moment at a pin) reads as 0, not 1e-16.
	if (Math.abs(v) < 1e-9) return '0';
	return Number(v.toPrecision(3)).toString();
}

/** The symbol of a quantity in a unit system, e.g. `kip/ft`. */
export function unitSymbol(q: SummaryQuantity, units: SummaryUnits): string {
	return SHOWN[units][q][1];
}

/** A value shown in `units` converted back to the SI output unit of its quantity. */
export function convertFrom(value: number, q: SummaryQuantity, units: SummaryUnits): number {
	return value * SHOWN[units][q][0];
}

/** An SI output value converted to the chosen units. */
export function convertTo(valueSI: number, q: SummaryQuantity, units: SummaryUnits): number {
	return valueSI / SHOWN[units][q][0];
}

/**
 * An SI output value in the chosen units, 3 significant figures, with its symbol.
 * @example
 * formatIn(10, 'force', 'us') // '2.25 kip'
 * formatIn(6, 'length', 'us') // '19.7 ft'
 */
export function formatIn(valueSI: number, q: SummaryQuantity, units: SummaryUnits): string {
	return `${formatNumber(convertTo(valueSI, q, units))} ${SHOWN[units][q][1]}`;
}
