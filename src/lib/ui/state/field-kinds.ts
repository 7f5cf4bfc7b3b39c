import type { Quantity } from '$lib/ui/format';
import type { CaseFile } from './case-file';
import { readPath } from './field-path';

/** What a numeric field holds: a physical quantity (converted for display) or a plain ratio. */
export type FieldKind = Quantity | 'ratio';

/** The rule a field's value must meet before the case goes to the engine. */
export type FieldRule = 'positive' | 'non-negative' | 'any';

/** Display kind and rule for one field path. */
export interface FieldInfo {
	kind: FieldKind;
	rule: FieldRule;
	/** May be left empty: the engine then takes its stated default. */
	optional?: boolean;
}

const FIXED: Record<string, FieldInfo> = {
	'beam.section.h': { kind: 'dimension', rule: 'positive' },
	'beam.section.b': { kind: 'dimension', rule: 'positive' },
	'beam.section.tw': { kind: 'dimension', rule: 'positive' },
	'beam.section.tf': { kind: 'dimension', rule: 'positive' },
	// Measured tubes: outside diameter and wall.
	'beam.section.d': { kind: 'dimension', rule: 'positive' },
	'beam.section.t': { kind: 'dimension', rule: 'positive' },
	// Left blank: r = 0, the smallest section properties (the engine says so in a warning).
	'beam.section.r': { kind: 'dimension', rule: 'non-negative', optional: true },
	'beam.section.mp': { kind: 'moment', rule: 'positive' },
	'beam.grade.fy': { kind: 'stress', rule: 'positive' },
	'beam.sectionLoss': { kind: 'dimension', rule: 'non-negative' },
	'beam.bearingLoads': { kind: 'dimension', rule: 'non-negative' },
	deflectionLimit: { kind: 'ratio', rule: 'positive' }
};

/**
 * Kind and rule of the numeric field at `path` of the case (loads depend on their kind).
 * @example
 * describeField('loads[0].value', c) // { kind: 'force', rule: 'any' } for a point load
 */
export function describeField(path: string, c: CaseFile): FieldInfo {
	if (FIXED[path]) return FIXED[path];
	if (/^beam\.spans\[\d+\]$/.test(path)) return { kind: 'length', rule: 'positive' };
	if (/^beam\.bearing\[\d+\]$/.test(path)) return { kind: 'dimension', rule: 'non-negative' };
	if (path.startsWith('factors.')) return { kind: 'ratio', rule: 'positive' };
	const load = /^(loads\[\d+\])\.(\w+)$/.exec(path);
	if (load) {
		const kind = readPath(c, `${load[1]}.kind`);
		if (['x', 'from', 'to'].includes(load[2])) return { kind: 'length', rule: 'non-negative' };
		if (load[2] === 'value' && kind === 'point') return { kind: 'force', rule: 'any' };
		return { kind: 'lineLoad', rule: 'any' };
	}
	return { kind: 'ratio', rule: 'any' };
}

/** The message for a number that breaks its field's rule, or null when it is fine. */
export function checkRule(value: number, rule: FieldRule): string | null {
	if (rule === 'positive' && !(value > 0)) return 'Must be more than zero.';
	if (rule === 'non-negative' && value < 0) return 'Must not be negative.';
	return null;
}
