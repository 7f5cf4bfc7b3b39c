/**
 * US steel pipe, standard (Std), extra-strong (XS) and double-extra-strong (XXS) weights, as
 * listed in the AISC Shapes Database v15.0 (outside diameter, nominal wall and nominal weight;
 * transcribed from the public CSV export of that database). Properties use the design wall
 * 0.93 × nominal, as the AISC Manual does for pipe (AISC 360-22 B4.2 for ERW; common practice for
 * pipe that may be seamless). Every row is tested against its nominal lb/ft
 * (test/validation/aisc-shapes-database-hss.test.ts).
 * Row: [nominal size, weight class, outside diameter, nominal wall, lb/ft], inches.
 */
export const PIPE_STANDARD = 'ASTM A53 (AISC Shapes Database v15.0)';

/** Default grade of the family, a material id: ASTM A53 Gr B (the AISC Manual's pipe grade). */
export const PIPE_DEFAULT_GRADE = 'A53-B';

/** Pipe rows. */
export const PIPE_ROWS: readonly (readonly [
	string,
	'Std' | 'XS' | 'XXS',
	number,
	number,
	number
])[] = [
	['26', 'Std', 26, 0.375, 103],
	['24', 'Std', 24, 0.375, 94.7],
	['20', 'Std', 20, 0.375, 78.7],
	['18', 'Std', 18, 0.375, 70.7],
	['16', 'Std', 16, 0.375, 62.6],
	['14', 'Std', 14, 0.375, 54.6],
	['12', 'Std', 12.75, 0.375, 49.6],
	['10', 'Std', 10.75, 0.365, 40.5],
	['8', 'Std', 8.625, 0.322, 28.6],
	['6', 'Std', 6.625, 0.28, 19],
	['5', 'Std', 5.563, 0.258, 14.6],
	['4', 'Std', 4.5, 0.237, 10.8],
	['3-1/2', 'Std', 4, 0.226, 9.12],
	['3', 'Std', 3.5, 0.216, 7.58],
	['2-1/2', 'Std', 2.875, 0.203, 5.8],
	['2', 'Std', 2.375, 0.154, 3.66],
	['1-1/2', 'Std', 1.9, 0.145, 2.72],
	['1-1/4', 'Std', 1.66, 0.14, 2.27],
	['1', 'Std', 1.315, 0.133, 1.68],
	['3/4', 'Std', 1.05, 0.113, 1.13],
	['1/2', 'Std', 0.84, 0.109, 0.85],
	['26', 'XS', 26, 0.5, 136],
	['24', 'XS', 24, 0.5, 126],
	['20', 'XS', 20, 0.5, 104],
	['18', 'XS', 18, 0.5, 93.5],
	['16', 'XS', 16, 0.5, 82.9],
	['14', 'XS', 14, 0.5, 72.2],
	['12', 'XS', 12.75, 0.5, 65.5],
	['10', 'XS', 10.75, 0.5, 54.8],
	['8', 'XS', 8.625, 0.5, 43.4],
	['6', 'XS', 6.625, 0.432, 28.6],
	['5', 'XS', 5.563, 0.375, 20.8],
	['4', 'XS', 4.5, 0.337, 15],
	['3-1/2', 'XS', 4, 0.318, 12.5],
	['3', 'XS', 3.5, 0.3, 10.3],
	['2-1/2', 'XS', 2.875, 0.276, 7.67],
	['2', 'XS', 2.375, 0.218, 5.03],
	['1-1/2', 'XS', 1.9, 0.2, 3.63],
	['1-1/4', 'XS', 1.66, 0.191, 3],
	['1', 'XS', 1.315, 0.179, 2.17],
	['3/4', 'XS', 1.05, 0.154, 1.48],
	['1/2', 'XS', 0.84, 0.147, 1.09],
	['12', 'XXS', 12.75, 1, 126],
	['10', 'XXS', 10.75, 1, 104],
	['8', 'XXS', 8.625, 0.875, 72.5],
	['6', 'XXS', 6.625, 0.864, 53.2],
	['5', 'XXS', 5.563, 0.75, 38.6],
	['4', 'XXS', 4.5, 0.674, 27.6],
	['3', 'XXS', 3.5, 0.6, 18.6],
	['2-1/2', 'XXS', 2.875, 0.552, 13.7],
	['2', 'XXS', 2.375, 0.436, 9.04]
];
