/**
 * US American Standard S beams, S3 to S24 (28 shapes). Dimensions in inches as published in the AISC Shapes
 * Database v15.0 (d, bf, tw, tf, kdes; transcribed from the public CSV export of that
 * database). S flanges are tapered and tf is the published mean thickness: the library models
 * the taper (S_FLANGE_SLOPE) with root fillets r = kdes − (flange thickness at the web face)
 * (test/validation/aisc-shapes-database-hp-s.test.ts).
 * Every row is tested against its nominal lb/ft (test/validation/aisc-shapes-database-hp-s.test.ts).
 * Row: [name 'S d x lb/ft', d, bf, tw, tf, kdes] in inches.
 */
export const S_STANDARD = 'ASTM A6/A6M (AISC Shapes Database v15.0)';

/** Default grade of the family, a material id: ASTM A36 (common practice for S shapes, which A992 does not cover). */
export const S_DEFAULT_GRADE = 'A36';

/** Flange slope of S shapes: 16⅔ % (2 in 12), from memory of ASTM A6 / the AISC Manual. */
export const S_FLANGE_SLOPE = 1 / 6;

/** S-shape rows, by nominal depth then weight. */
export const S_ROWS: readonly (readonly [string, number, number, number, number, number])[] = [
	['S3x5.7', 3, 2.33, 0.17, 0.26, 0.625],
	['S3x7.5', 3, 2.51, 0.349, 0.26, 0.625],
	['S4x7.7', 4, 2.66, 0.193, 0.293, 0.75],
	['S4x9.5', 4, 2.8, 0.326, 0.293, 0.75],
	['S5x10', 5, 3, 0.214, 0.326, 0.75],
	['S6x12.5', 6, 3.33, 0.232, 0.359, 0.813],
	['S6x17.25', 6, 3.57, 0.465, 0.359, 0.813],
	['S8x18.4', 8, 4, 0.271, 0.425, 1],
	['S8x23', 8, 4.17, 0.441, 0.425, 1],
	['S10x25.4', 10, 4.66, 0.311, 0.491, 1.13],
	['S10x35', 10, 4.94, 0.594, 0.491, 1.13],
	['S12x31.8', 12, 5, 0.35, 0.544, 1.19],
	['S12x35', 12, 5.08, 0.428, 0.544, 1.19],
	['S12x40.8', 12, 5.25, 0.462, 0.659, 1.44],
	['S12x50', 12, 5.48, 0.687, 0.659, 1.44],
	['S15x42.9', 15, 5.5, 0.411, 0.622, 1.38],
	['S15x50', 15, 5.64, 0.55, 0.622, 1.38],
	['S18x54.7', 18, 6, 0.461, 0.691, 1.5],
	['S18x70', 18, 6.25, 0.711, 0.691, 1.5],
	['S20x66', 20, 6.26, 0.505, 0.795, 1.63],
	['S20x75', 20, 6.39, 0.635, 0.795, 1.63],
	['S20x86', 20.3, 7.06, 0.66, 0.92, 1.75],
	['S20x96', 20.3, 7.2, 0.8, 0.92, 1.75],
	['S24x80', 24, 7, 0.5, 0.87, 1.75],
	['S24x90', 24, 7.13, 0.625, 0.87, 1.75],
	['S24x100', 24, 7.25, 0.745, 0.87, 1.75],
	['S24x106', 24.5, 7.87, 0.62, 1.09, 2],
	['S24x121', 24.5, 8.05, 0.8, 1.09, 2]
];
