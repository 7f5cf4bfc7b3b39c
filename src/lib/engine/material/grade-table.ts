import type { GradeBand, GradeRow } from './types';
import { US_GRADE_ROWS } from './us-grades';

/** Bands from parallel lists: band tops (mm), fy and fu (N/mm²). */
function makeBands(tops: number[], fy: number[], fu: number[]): GradeBand[] {
	return tops.map((upTo, i) => ({ upTo, fy: fy[i], fu: fu[i] }));
}

const EN_TOPS = [16, 40, 63, 80, 100, 150, 200, 250];
const EN_10025_2 = 'EN 10025-2:2004 Table 7';
const EN_SOURCE = '[C, secondary: reproduction of BS EN 10025-2:2004 Table 7]';
const ONE_BAND = [250];

/**
 * European grades as data, each with its source tag (engineering reference B.1).
 * fu is the lower end of the standard's Rm range: 3 ≤ t ≤ 100 mm, then the ranges above.
 */
const EN_GRADE_ROWS: readonly GradeRow[] = [
	{
		id: 'S235',
		name: 'S235 (EN 10025-2)',
		standard: EN_10025_2,
		region: 'eurocode',
		source: EN_SOURCE,
		bands: makeBands(
			EN_TOPS,
			[235, 225, 215, 215, 215, 195, 185, 175],
			[360, 360, 360, 360, 360, 350, 340, 340]
		)
	},
	{
		id: 'S275',
		name: 'S275 (EN 10025-2)',
		standard: EN_10025_2,
		region: 'eurocode',
		source: EN_SOURCE,
		bands: makeBands(
			EN_TOPS,
			[275, 265, 255, 245, 235, 225, 215, 205],
			[410, 410, 410, 410, 410, 400, 380, 380]
		)
	},
	{
		id: 'S355',
		name: 'S355 (EN 10025-2)',
		standard: EN_10025_2,
		region: 'eurocode',
		source: EN_SOURCE,
		bands: makeBands(
			EN_TOPS,
			[355, 345, 335, 325, 315, 295, 285, 275],
			[470, 470, 470, 470, 470, 450, 450, 450]
		)
	},
	{
		id: 'S460',
		name: 'S460 M/ML (EN 10025-4)',
		standard: 'EN 10025-4 (S460M/ML)',
		region: 'eurocode',
		source: '[M: EN 10025-4 thickness steps; fu from EN 1993-1-1 Table 3.1]',
		note:
			'S460 is not in EN 10025-2:2004; these are the thermomechanically rolled S460M/ML ' +
			'values (EN 10025-3 S460N/NL has the same yield steps).',
		bands: makeBands([16, 40, 63, 80, 100], [460, 440, 430, 410, 400], [540, 540, 530, 530, 530])
	}
];

/** Current grades of both bases, then the lower bound for unidentified mild steel. */
export const GRADE_ROWS: readonly GradeRow[] = [
	...EN_GRADE_ROWS,
	...US_GRADE_ROWS,
	{
		id: 'unknown-old',
		name: 'Older steel, grade unknown',
		standard: 'Lower bound for unidentified mild steel',
		source: '[C: CISC guidance on historical structural steels, 210 / 380 MPa] [P: app default]',
		needsConfirmation: true,
		note:
			'A conservative lower bound pending coupon tests. ' +
			'Confirm the member is steel, not cast or wrought iron.',
		bands: makeBands(ONE_BAND, [210], [380])
	}
];
