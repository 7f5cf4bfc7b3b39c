import type { GradeBand, GradeRow } from './types';
import { US } from '../units';

/** ksi to N/mm², unrounded. */
const ksi = (value: number): number => value * US.ksiToMPa;

/** Bands from thickness tops in inches and Fy, Fu in ksi. */
function bandsInInches(rows: [number, number, number][]): GradeBand[] {
	return rows.map(([topIn, fy, fu]) => ({ upTo: topIn * US.inToMm, fy: ksi(fy), fu: ksi(fu) }));
}

const DG15 = 'AISC Design Guide 15 (historic ASTM specifications)';
const CONFIRM =
	'Minimum yield of the ASTM specification of the era, as US rehabilitation guidance lists it; ' +
	'confirm the date and the specification from drawings or mill records, that the member is ' +
	'steel (before about 1900 wrought iron was common), and consider coupon tests.';

/** A historic US row: a default the user must confirm. */
function makeRow(row: Omit<GradeRow, 'region' | 'needsConfirmation' | 'note'>): GradeRow {
	return { ...row, region: 'us', needsConfirmation: true, note: CONFIRM };
}

/**
 * Older US buildings by ASTM specification and era (engineering reference E.2). Values before 1924
 * and for A373 and A441 are recalled from AISC Design Guide 15 and the ASTM standards of the time.
 */
export const US_HISTORIC_GRADE_ROWS: readonly GradeRow[] = [
	makeRow({
		id: 'A9-1900',
		name: 'ASTM A7 / A9 (1900–1923)',
		standard: `ASTM A7 and A9 editions 1900–1923; ${DG15}`,
		source:
			'[M: DG15 as recalled: yield at least ½ the tensile strength, tensile from 55 ksi; ' +
			'the lowest combination (27.5 / 55 ksi) is taken]',
		bands: bandsInInches([[10, 27.5, 55]])
	}),
	makeRow({
		id: 'A7-1924',
		name: 'ASTM A7 / A9 (1924–1938)',
		standard: `ASTM A7 and A9, 1924–1938; ${DG15}`,
		source:
			'[C, secondary: quotation of AISC "Iron and Steel Beams 1873 to 1952", p. 7: tensile ' +
			'55–65 ksi, yield ≥ ½ tensile and not less than 30 ksi]',
		bands: bandsInInches([[10, 30, 55]])
	}),
	makeRow({
		id: 'A7',
		name: 'ASTM A7 (1939–1967)',
		standard: 'ASTM A7-39 onward',
		source: '[C, secondary: quotation of the A7-39 requirements: yield ≥ 33, tensile 60–72 ksi]',
		bands: bandsInInches([[10, 33, 60]])
	}),
	makeRow({
		id: 'A373',
		name: 'ASTM A373 (1954–1965)',
		standard: `ASTM A373; ${DG15}`,
		source: '[M: ASTM A373 structural steel for welding, 32 / 58 ksi, from memory]',
		bands: bandsInInches([[10, 32, 58]])
	}),
	makeRow({
		id: 'A441',
		name: 'ASTM A441 high-strength low-alloy (1955–1989)',
		standard: `ASTM A441; ${DG15}`,
		source:
			'[M: ASTM A441 by thickness: ≤ ¾ in 50 / 70, ≤ 1½ in 46 / 67, ≤ 4 in 42 / 63, ' +
			'≤ 8 in 40 / 60 ksi, from memory]',
		bands: bandsInInches([
			[0.75, 50, 70],
			[1.5, 46, 67],
			[4, 42, 63],
			[8, 40, 60]
		])
	})
];
