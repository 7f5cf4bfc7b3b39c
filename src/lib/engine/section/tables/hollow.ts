/**
 * Hot-finished structural hollow sections, sizes from memory of the common range of
 * EN 10210-2:2006. Corner radii follow the standard's basis for calculation (ro = 1.5t, ri = t),
 * applied when the library is built. Rows in mm: SHS and RHS [h, b, t]; CHS [d, t].
 */
export const HOLLOW_STANDARD = 'EN 10210-2:2006';

/** Square hollow sections [h, b, t]. */
export const SHS_ROWS: readonly (readonly [number, number, number])[] = [
	[40, 40, 3.2],
	[40, 40, 4],
	[50, 50, 3.2],
	[50, 50, 4],
	[50, 50, 5],
	[60, 60, 4],
	[60, 60, 5],
	[70, 70, 5],
	[80, 80, 5],
	[80, 80, 6.3],
	[90, 90, 5],
	[90, 90, 6.3],
	[100, 100, 5],
	[100, 100, 6.3],
	[100, 100, 8],
	[120, 120, 6.3],
	[120, 120, 8],
	[140, 140, 8],
	[150, 150, 8],
	[150, 150, 10],
	[200, 200, 10],
	[200, 200, 12.5],
	[250, 250, 10],
	[300, 300, 12.5]
];

/** Rectangular hollow sections [h, b, t], h the larger (major-axis bending). */
export const RHS_ROWS: readonly (readonly [number, number, number])[] = [
	[100, 50, 5],
	[120, 60, 5],
	[120, 80, 6.3],
	[150, 100, 6.3],
	[160, 80, 6.3],
	[200, 100, 6.3],
	[200, 100, 8],
	[250, 150, 8],
	[300, 200, 10]
];

/** Circular hollow sections [d, t]. */
export const CHS_ROWS: readonly (readonly [number, number])[] = [
	[48.3, 3.2],
	[60.3, 3.2],
	[76.1, 3.2],
	[88.9, 4],
	[114.3, 5],
	[139.7, 5],
	[168.3, 6.3],
	[219.1, 8],
	[273, 10],
	[323.9, 10]
];
