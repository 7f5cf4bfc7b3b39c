/**
 * US bearing-pile HP shapes, HP8 to HP18 (22 shapes). Dimensions in inches as published in the AISC Shapes
 * Database v15.0 (d, bf, tw, tf, kdes; transcribed from the public CSV export of that
 * database); r = kdes − tf as for W shapes. For HP8x36 and HP10x42 the database's kdes equals
 * the detailing k, so their fillet, area and Ix come out up to 3 % high.
 * Every row is tested against its nominal lb/ft (test/validation/aisc-shapes-database-hp-s.test.ts).
 * Row: [name 'HP d x lb/ft', d, bf, tw, tf, kdes] in inches.
 */
export const HP_STANDARD = 'ASTM A6/A6M (AISC Shapes Database v15.0)';

/** Default grade of the family, a material id: ASTM A572 Gr 50 (common practice for HP piles; A992 covers W shapes only). */
export const HP_DEFAULT_GRADE = 'A572-50';

/** HP-shape rows, by nominal depth then weight. */
export const HP_ROWS: readonly (readonly [string, number, number, number, number, number])[] = [
	['HP8x36', 8.02, 8.16, 0.445, 0.445, 1.13],
	['HP10x42', 9.7, 10.1, 0.415, 0.42, 1.13],
	['HP10x57', 9.99, 10.2, 0.565, 0.565, 1.25],
	['HP12x53', 11.8, 12, 0.435, 0.435, 1.13],
	['HP12x63', 11.9, 12.1, 0.515, 0.515, 1.25],
	['HP12x74', 12.1, 12.2, 0.605, 0.61, 1.31],
	['HP12x84', 12.3, 12.3, 0.685, 0.685, 1.38],
	['HP12x89', 12.4, 12.3, 0.72, 0.72, 1.32],
	['HP14x73', 13.6, 14.6, 0.505, 0.505, 1.19],
	['HP14x89', 13.8, 14.7, 0.615, 0.615, 1.31],
	['HP14x102', 14, 14.8, 0.705, 0.705, 1.38],
	['HP14x117', 14.2, 14.9, 0.805, 0.805, 1.5],
	['HP16x88', 15.3, 15.7, 0.54, 0.54, 1.72],
	['HP16x101', 15.5, 15.8, 0.625, 0.625, 1.81],
	['HP16x121', 15.8, 15.9, 0.75, 0.75, 1.93],
	['HP16x141', 16, 16, 0.875, 0.875, 2.06],
	['HP16x162', 16.3, 16.1, 1, 1, 2.18],
	['HP16x183', 16.5, 16.3, 1.13, 1.13, 2.31],
	['HP18x135', 17.5, 17.8, 0.75, 0.75, 1.93],
	['HP18x157', 17.7, 17.9, 0.87, 0.87, 2.05],
	['HP18x181', 18, 18, 1, 1, 2.18],
	['HP18x204', 18.3, 18.1, 1.13, 1.13, 2.31]
];
