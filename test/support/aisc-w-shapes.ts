/**
 * W-shape properties for the AISC validation tests, in inches as the tables print them.
 * Rows tagged `database` are the AISC Shapes Database v15.0 values of engineering reference D.3
 * (confirmed there against the database); rows tagged `memory` are recalled from the same
 * database and marked "from memory" wherever a test uses them.
 */
import { in3, in4, in6, inch } from './us-customary';

export interface WShapeRow {
	name: string;
	source: 'database' | 'memory';
	d: number;
	bf: number;
	tw: number;
	tf: number;
	kdes: number;
	Sx: number;
	Zx: number;
	Iy: number;
	ry: number;
	J: number;
	Cw: number;
	/** Tabulated rts and ho (database rows only; memory rows derive them). */
	rts?: number;
	ho?: number;
}

const row = (
	name: string,
	source: WShapeRow['source'],
	v: [number, number, number, number, number, number, number, number, number, number, number]
): WShapeRow => {
	const [d, bf, tw, tf, kdes, Sx, Zx, Iy, ry, J, Cw] = v;
	return { name, source, d, bf, tw, tf, kdes, Sx, Zx, Iy, ry, J, Cw };
};

// [d, bf, tw, tf, kdes, Sx, Zx, Iy, ry, J, Cw] in in, in³, in⁴, in⁶.
export const W_PROPS: Record<string, WShapeRow> = {
	W8x31: {
		...row(
			'W8x31',
			'database',
			[8.0, 8.0, 0.285, 0.435, 0.829, 27.5, 30.4, 37.1, 2.02, 0.536, 530]
		),
		rts: 2.26,
		ho: 7.57
	},
	W10x33: {
		...row(
			'W10x33',
			'database',
			[9.73, 7.96, 0.29, 0.435, 0.935, 35.0, 38.8, 36.6, 1.94, 0.583, 791]
		),
		rts: 2.2,
		ho: 9.3
	},
	W12x26: {
		...row('W12x26', 'database', [12.2, 6.49, 0.23, 0.38, 0.68, 33.4, 37.2, 17.3, 1.51, 0.3, 607]),
		rts: 1.75,
		ho: 11.8
	},
	W14x22: {
		...row(
			'W14x22',
			'database',
			[13.7, 5.0, 0.23, 0.335, 0.735, 29.0, 33.2, 7.0, 1.04, 0.208, 314]
		),
		rts: 1.27,
		ho: 13.4
	},
	W16x40: {
		...row(
			'W16x40',
			'database',
			[16.0, 7.0, 0.305, 0.505, 0.907, 64.7, 73.0, 28.9, 1.57, 0.794, 1730]
		),
		rts: 1.86,
		ho: 15.5
	},
	W18x35: {
		...row(
			'W18x35',
			'database',
			[17.7, 6.0, 0.3, 0.425, 0.827, 57.6, 66.5, 15.3, 1.22, 0.506, 1140]
		),
		rts: 1.51,
		ho: 17.3
	},
	W21x44: {
		...row('W21x44', 'database', [20.7, 6.5, 0.35, 0.45, 0.95, 81.6, 95.4, 20.7, 1.26, 0.77, 2110]),
		rts: 1.6,
		ho: 20.3
	},
	W18x50: {
		...row(
			'W18x50',
			'database',
			[18.0, 7.5, 0.355, 0.57, 0.972, 88.9, 101, 40.1, 1.65, 1.24, 3040]
		),
		rts: 1.98,
		ho: 17.4
	},
	W24x62: {
		...row('W24x62', 'database', [23.7, 7.04, 0.43, 0.59, 1.09, 131, 153, 34.5, 1.38, 1.71, 4620]),
		rts: 1.75,
		ho: 23.1
	},
	W24x55: row(
		'W24x55',
		'memory',
		[23.6, 7.01, 0.395, 0.505, 1.01, 114, 134, 29.1, 1.34, 1.18, 3870]
	),
	W21x50: row(
		'W21x50',
		'memory',
		[20.8, 6.53, 0.38, 0.535, 0.935, 94.5, 110, 24.9, 1.3, 1.14, 2570]
	),
	W21x48: row(
		'W21x48',
		'memory',
		[20.6, 8.14, 0.35, 0.43, 0.93, 93.0, 107, 38.7, 1.66, 0.803, 3950]
	),
	W16x31: row(
		'W16x31',
		'memory',
		[15.9, 5.53, 0.275, 0.44, 0.747, 47.2, 54.0, 12.4, 1.17, 0.461, 739]
	),
	W16x26: row(
		'W16x26',
		'memory',
		[15.7, 5.5, 0.25, 0.345, 0.747, 38.4, 44.2, 9.59, 1.12, 0.262, 565]
	)
};

/** rts (tabulated, or F2-7 from Iy, Cw, Sx) and ho (tabulated, or d − tf), inches. */
export function rtsAndHo(s: WShapeRow): { rts: number; ho: number } {
	return {
		rts: s.rts ?? Math.sqrt(Math.sqrt(s.Iy * s.Cw) / s.Sx),
		ho: s.ho ?? s.d - s.tf
	};
}

/** The engine's I-shape inputs in mm (h = d − 2kdes for rolled shapes). */
export function toEngineIShape(s: WShapeRow) {
	const { rts, ho } = rtsAndHo(s);
	return {
		Zx: in3(s.Zx),
		Sx: in3(s.Sx),
		ry: inch(s.ry),
		rts: inch(rts),
		J: in4(s.J),
		ho: inch(ho),
		bf: inch(s.bf),
		tf: inch(s.tf),
		h: inch(s.d - 2 * s.kdes),
		tw: inch(s.tw),
		d: inch(s.d),
		Iy: in4(s.Iy),
		Cw: in6(s.Cw)
	};
}
