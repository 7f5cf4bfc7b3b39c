import type { SectionRecord } from './make-section';
import { replaceFractions } from './fraction';
import { computeHssCornerRadii, designWallFactor } from './hss-wall';
import { W_DEFAULT_GRADE, W_ROWS, W_STANDARD } from './tables/w-shapes';
import { HP_DEFAULT_GRADE, HP_ROWS, HP_STANDARD } from './tables/hp-shapes';
import { S_DEFAULT_GRADE, S_FLANGE_SLOPE, S_ROWS, S_STANDARD } from './tables/s-shapes';
import { HSS_DEFAULT_GRADE, HSS_RECT_ROWS, HSS_ROUND_ROWS, HSS_STANDARD } from './tables/hss';
import { PIPE_DEFAULT_GRADE, PIPE_ROWS, PIPE_STANDARD } from './tables/pipe';
import { US } from '../units';

/** Inches to mm, kept to a micrometre so table values stay readable in mm. */
const mm = (inch: number) => Math.round(inch * US.inToMm * 1000) / 1000;

/**
 * Rolled I rows in inches to mm. US tables give kdes, not a root radius: W and HP take
 * r = kdes − tf (reference D.0). S flanges are tapered: S rows carry the flange slope and take
 * r = kdes less the flange thickness at the web face (see computeTaperedIProperties).
 */
function buildRolled(
	family: 'W' | 'HP' | 'S',
	rows: readonly (readonly [string, number, number, number, number, number])[],
	standard: string,
	defaultGrade: string
): SectionRecord[] {
	return rows.map(([designation, d, bf, tw, tf, kdes]) => {
		// S: kdes is measured from the flange face at the web, where the taper makes it thicker.
		const atWeb = tf + S_FLANGE_SLOPE * (bf / 4 - tw / 2);
		const flange =
			family === 'S' ? { r: mm(kdes - atWeb), slope: S_FLANGE_SLOPE } : { r: mm(kdes - tf) };
		const dims = { h: mm(d), b: mm(bf), tw: mm(tw), tf: mm(tf), ...flange };
		const nominalMass = Number(designation.split('x')[1]) * US.lbPerFtToKgPerM;
		const shape = 'I' as const;
		return { designation, family, standard, shape, dims, defaultGrade, nominalMass };
	});
}

/** Rectangular and round HSS: dimensions from the label, design wall 0.93 × nominal (A500). */
function buildHss(): SectionRecord[] {
	const factor = designWallFactor(HSS_DEFAULT_GRADE);
	const common = {
		family: 'HSS' as const,
		standard: HSS_STANDARD,
		defaultGrade: HSS_DEFAULT_GRADE
	};
	const rect = HSS_RECT_ROWS.map(([label, lbPerFt]) => {
		const [h, b, wall] = replaceFractions(label).split('x').map(Number);
		const t = mm(wall) * factor;
		const dims = { h: mm(h), b: mm(b), t, ...computeHssCornerRadii(t) };
		const nominal = { nominalMass: lbPerFt * US.lbPerFtToKgPerM, nominalWall: mm(wall) };
		return { ...common, designation: `HSS${label}`, shape: 'RHS' as const, dims, ...nominal };
	});
	const round = HSS_ROUND_ROWS.map(([label, lbPerFt]) => {
		const [d, wall] = label.split('x').map(Number);
		const dims = { d: mm(d), t: mm(wall) * factor };
		const nominal = { nominalMass: lbPerFt * US.lbPerFtToKgPerM, nominalWall: mm(wall) };
		return { ...common, designation: `HSS${label}`, shape: 'CHS' as const, dims, ...nominal };
	});
	return [...rect, ...round];
}

/** Pipe: outside diameter and design wall 0.93 × nominal, as the AISC Manual tabulates pipe. */
function buildPipe(): SectionRecord[] {
	const factor = designWallFactor(PIPE_DEFAULT_GRADE);
	return PIPE_ROWS.map(([size, weight, od, wall, lbPerFt]): SectionRecord => ({
		designation: `Pipe ${size} ${weight}`,
		family: 'PIPE',
		standard: PIPE_STANDARD,
		shape: 'CHS',
		dims: { d: mm(od), t: mm(wall) * factor },
		defaultGrade: PIPE_DEFAULT_GRADE,
		nominalMass: lbPerFt * US.lbPerFtToKgPerM,
		nominalWall: mm(wall)
	}));
}

/** Every US section of the library as records: W, HP, S, HSS and pipe, in table order. */
export function buildUsSections(): SectionRecord[] {
	return [
		...buildRolled('W', W_ROWS, W_STANDARD, W_DEFAULT_GRADE),
		...buildRolled('HP', HP_ROWS, HP_STANDARD, HP_DEFAULT_GRADE),
		...buildRolled('S', S_ROWS, S_STANDARD, S_DEFAULT_GRADE),
		...buildHss(),
		...buildPipe()
	];
}
