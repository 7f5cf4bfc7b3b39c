import type { GradeBand, GradeRow } from './types';
import { US } from '../units';

/** ksi to N/mm², unrounded: the AISC basis works with the published ksi values themselves. */
const ksi = (value: number): number => value * US.ksiToMPa;

/** One band for every thickness of the product (the standards give one minimum for shapes). */
function oneBand(fy: number, fu: number): GradeBand[] {
	return [{ upTo: 250, fy: ksi(fy), fu: ksi(fu) }];
}

const TABLE_2_4 = 'AISC Manual Table 2-4';
const HOLLOW = ['rectangular-hollow', 'round-hollow'] as const;

/**
 * Current US structural steels: minimum Fy and Fu (lower end of the tensile range) as the ASTM
 * standards give them, summarised in AISC Manual Tables 2-4 and 2-5 (engineering reference C.1).
 * ASTM A500 gives different minimums for round and for shaped (rectangular) HSS.
 */
export const US_GRADE_ROWS: readonly GradeRow[] = [
	{
		id: 'A992',
		name: 'ASTM A992',
		standard: 'ASTM A992',
		source: '[C: AISC Modern Steel Construction, "Are You Properly Specifying Materials?" (2009)]',
		region: 'us',
		products: ['open'],
		bands: oneBand(50, 65)
	},
	{
		id: 'A36',
		name: 'ASTM A36',
		standard: 'ASTM A36',
		source: `[C, secondary: summary of ${TABLE_2_4}]`,
		region: 'us',
		products: ['open'],
		bands: oneBand(36, 58)
	},
	{
		id: 'A572-50',
		name: 'ASTM A572 Grade 50',
		standard: 'ASTM A572',
		source: `[M: ASTM A572 Gr 50; ${TABLE_2_4}, from memory]`,
		region: 'us',
		products: ['open'],
		bands: oneBand(50, 65)
	},
	{
		id: 'A500-B',
		name: 'ASTM A500 Grade B',
		standard: 'ASTM A500',
		source: `[M: ASTM A500 Gr B, rectangular 46 / 58 ksi, round 42 / 58 ksi; ${TABLE_2_4}, from memory]`,
		region: 'us',
		products: HOLLOW,
		bands: oneBand(46, 58),
		roundBands: oneBand(42, 58)
	},
	{
		id: 'A500-C',
		name: 'ASTM A500 Grade C',
		standard: 'ASTM A500',
		source: `[C, secondary: summary of ${TABLE_2_4}: rectangular 50 ksi, round 46 ksi, Fu 62 ksi]`,
		region: 'us',
		products: HOLLOW,
		bands: oneBand(50, 62),
		roundBands: oneBand(46, 62)
	},
	{
		id: 'A1085',
		name: 'ASTM A1085 Grade A',
		standard: 'ASTM A1085',
		source: `[M: ASTM A1085 Gr A, 50 / 65 ksi for round and rectangular; ${TABLE_2_4}, from memory]`,
		region: 'us',
		products: HOLLOW,
		bands: oneBand(50, 65)
	},
	{
		id: 'A53-B',
		name: 'ASTM A53 Grade B (pipe)',
		standard: 'ASTM A53',
		source: `[C, secondary: summary of ${TABLE_2_4}]`,
		region: 'us',
		products: ['round-hollow'],
		bands: oneBand(35, 60)
	}
];
