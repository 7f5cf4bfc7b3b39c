/**
 * Measured mode of the section: which shapes can be measured, the fields of each, and the
 * measurements the section tables are searched with for the nearest rows.
 */
import type { SectionMeasurements } from '$lib/engine/section';
import { BLANK } from './blank-value';
import type { CaseSection } from './case-file';

/** Shapes the form measures: rolled I or H, rectangular or square tube, round tube. */
export type MeasuredShape = 'I' | 'RHS' | 'CHS';

/** The shape choices in the order the form shows them. */
export const MEASURED_SHAPES: readonly { id: MeasuredShape; name: string }[] = [
	{ id: 'I', name: 'I or H section' },
	{ id: 'RHS', name: 'Rectangular or square tube' },
	{ id: 'CHS', name: 'Round tube' }
];

/** One number field of a measured shape. */
export interface MeasuredField {
	key: string;
	label: string;
	hint?: string;
}

const WALL_HINT = 'Wall gauge reading. US tubes are compared with their nominal wall.';

/** The fields of each shape, in the order they are measured. */
export const MEASURED_FIELDS: Record<MeasuredShape, readonly MeasuredField[]> = {
	I: [
		{ key: 'h', label: 'Depth h' },
		{ key: 'b', label: 'Flange width b' },
		{ key: 'tw', label: 'Web thickness tw' },
		{ key: 'tf', label: 'Flange thickness tf' },
		{
			key: 'r',
			label: 'Root radius r',
			hint: 'Leave blank if not measured: r = 0 is then used, which gives the smallest section properties (cautious).'
		}
	],
	RHS: [
		{ key: 'h', label: 'Depth h' },
		{ key: 'b', label: 'Width b' },
		{ key: 't', label: 'Wall thickness t', hint: WALL_HINT }
	],
	CHS: [
		{ key: 'd', label: 'Outside diameter d' },
		{ key: 't', label: 'Wall thickness t', hint: WALL_HINT }
	]
};

/**
 * A measured section of the shape with every size still to be entered (a hot-finished tube until
 * the user says it is cold-formed).
 * @example blankMeasured('CHS') // { shape: 'CHS', d: null, t: null }
 */
export function blankMeasured(shape: MeasuredShape): CaseSection {
	if (shape === 'RHS') return { shape: 'RHS', h: BLANK, b: BLANK, t: BLANK, process: 'hot' };
	if (shape === 'CHS') return { shape: 'CHS', d: BLANK, t: BLANK };
	return { shape: 'I', h: BLANK, b: BLANK, tw: BLANK, tf: BLANK };
}

/** The measured shape of the section; null for a table row, a known Mp or another shape. */
export function readMeasuredShape(section: CaseSection): MeasuredShape | null {
	if (!('shape' in section)) return null;
	return MEASURED_SHAPES.some((s) => s.id === section.shape)
		? (section.shape as MeasuredShape)
		: null;
}

/**
 * What the tables are searched with: every size of the shape's search set entered (h, b, tf, tw
 * of an I; h, b, t of a tube; d, t of a round tube), else null. The root radius is not searched.
 * @example measurementsOf({ shape: 'CHS', d: 168.3, t: 6.3 }) // { d: 168.3, t: 6.3 }
 */
export function measurementsOf(section: CaseSection): SectionMeasurements | null {
	const shape = readMeasuredShape(section);
	if (!shape) return null;
	const keys = { I: ['h', 'b', 'tf', 'tw'], RHS: ['h', 'b', 't'], CHS: ['d', 't'] }[shape];
	const values = section as unknown as Record<string, unknown>;
	const out: Record<string, number> = {};
	for (const key of keys) {
		const v = values[key];
		if (typeof v !== 'number' || !Number.isFinite(v)) return null;
		out[key] = v;
	}
	return out as SectionMeasurements;
}
