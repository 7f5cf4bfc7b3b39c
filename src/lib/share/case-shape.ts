/**
 * Whether a case from outside (a link, a stored or imported record) has the structure the check
 * screen reads: the lists and objects it draws and edits, of the right kinds. Values themselves
 * (a negative span, an unknown grade, a number not entered yet, kept as null) are left to the
 * engine, whose messages the form shows by each field; a hollow case (`{ beam: {} }`) would
 * instead break the screen.
 */
import { SIZE_LIMITS } from '$lib/engine/case/limits';
import { isPlainObject } from '$lib/storage/case-file';

/** The first thing that keeps the screen from showing a case. */
export interface ShapeProblem {
	path: string;
	problem: string;
}

/** The numbers each kind of load is drawn from. */
const LOAD_NUMBERS: Readonly<Record<string, readonly string[]>> = {
	point: ['x', 'value'],
	uniform: ['from', 'to', 'value'],
	linear: ['from', 'to', 'start', 'end']
};

const NOT_NUMBER = 'not a number';
const NOT_TEXT = 'not text';

/**
 * The first structural problem of a case, or null when the screen can show it.
 * @example
 * findShapeProblem({ beam: {}, loads: [] }) // { path: 'beam.spans', problem: 'missing' }
 */
export function findShapeProblem(c: unknown): ShapeProblem | null {
	// Copies of the case assign keys one by one, and `__proto__` would become the prototype.
	const hidden = findKey(c, '__proto__');
	if (hidden !== null) return { path: hidden, problem: 'a field named __proto__ is not accepted' };
	if (!isPlainObject(c)) return { path: '', problem: 'not an object' };
	if (c.title !== undefined && typeof c.title !== 'string') {
		return { path: 'title', problem: NOT_TEXT };
	}
	return findBeamProblem(c.beam) ?? findLoadsProblem(c.loads) ?? findOptionsProblem(c);
}

function findBeamProblem(beam: unknown): ShapeProblem | null {
	if (!isPlainObject(beam)) return { path: 'beam', problem: 'missing' };
	const spans = beam.spans;
	if (!Array.isArray(spans) || spans.length === 0) {
		return { path: 'beam.spans', problem: 'missing' };
	}
	if (spans.length > SIZE_LIMITS.spans) {
		return { path: 'beam.spans', problem: `more than ${SIZE_LIMITS.spans} spans` };
	}
	const span = spans.findIndex((s) => !isNumberOrBlank(s));
	if (span >= 0) return { path: `beam.spans[${span}]`, problem: NOT_NUMBER };
	const supports = beam.supports;
	if (!Array.isArray(supports) || supports.length > SIZE_LIMITS.spans + 1) {
		return { path: 'beam.supports', problem: 'missing' };
	}
	const support = supports.findIndex((s) => typeof s !== 'string');
	if (support >= 0) return { path: `beam.supports[${support}]`, problem: NOT_TEXT };
	const joints = optionalList(beam.joints, 'beam.joints', (j) => typeof j === 'string', NOT_TEXT);
	if (joints) return joints;
	const section = beam.section;
	const sections = Array.isArray(section) ? section : [section];
	if (sections.length === 0 || sections.length > spans.length || !sections.every(isPlainObject)) {
		return { path: 'beam.section', problem: 'missing' };
	}
	if (beam.grade !== undefined && typeof beam.grade !== 'string' && !isPlainObject(beam.grade)) {
		return { path: 'beam.grade', problem: 'neither a grade name nor strengths' };
	}
	if (beam.selfWeight !== undefined && typeof beam.selfWeight !== 'boolean') {
		return { path: 'beam.selfWeight', problem: 'not yes or no' };
	}
	const bearing = optionalList(beam.bearing, 'beam.bearing', isNumberOrBlank, NOT_NUMBER);
	if (bearing) return bearing;
	return findRestraintProblem(beam.restraint);
}

function findRestraintProblem(restraint: unknown): ShapeProblem | null {
	if (restraint === undefined) return null;
	if (!isPlainObject(restraint)) return { path: 'beam.restraint', problem: 'not an object' };
	const lateral = restraint.lateral;
	if (typeof lateral !== 'string') {
		if (!Array.isArray(lateral) || lateral.length > SIZE_LIMITS.restraints) {
			const problem = 'neither a choice nor a list of positions';
			return { path: 'beam.restraint.lateral', problem };
		}
		const at = lateral.findIndex((x) => !isNumberOrBlank(x));
		if (at >= 0) return { path: `beam.restraint.lateral[${at}]`, problem: NOT_NUMBER };
	}
	if (restraint.loadHeight !== undefined && typeof restraint.loadHeight !== 'string') {
		return { path: 'beam.restraint.loadHeight', problem: NOT_TEXT };
	}
	return null;
}

function findLoadsProblem(loads: unknown): ShapeProblem | null {
	if (!Array.isArray(loads)) return { path: 'loads', problem: 'missing' };
	if (loads.length > SIZE_LIMITS.loads) {
		return { path: 'loads', problem: `more than ${SIZE_LIMITS.loads} loads` };
	}
	for (const [i, load] of loads.entries()) {
		const path = `loads[${i}]`;
		if (!isPlainObject(load)) return { path, problem: 'not a load' };
		const kind = typeof load.kind === 'string' ? load.kind : '';
		const numbers = Object.hasOwn(LOAD_NUMBERS, kind) ? LOAD_NUMBERS[kind] : null;
		if (!numbers) return { path: `${path}.kind`, problem: 'not point, uniform or linear' };
		const missing = numbers.find((key) => !isNumberOrBlank(load[key]));
		if (missing) return { path: `${path}.${missing}`, problem: NOT_NUMBER };
		if (typeof load.action !== 'string') return { path: `${path}.action`, problem: NOT_TEXT };
		if (load.label !== undefined && typeof load.label !== 'string') {
			return { path: `${path}.label`, problem: NOT_TEXT };
		}
	}
	return null;
}

function findOptionsProblem(c: Record<string, unknown>): ShapeProblem | null {
	if (c.factors === undefined || isPlainObject(c.factors)) return null;
	return { path: 'factors', problem: 'not an object' };
}

function optionalList(
	value: unknown,
	path: string,
	fits: (item: unknown) => boolean,
	problem: string
): ShapeProblem | null {
	if (value === undefined) return null;
	if (!Array.isArray(value) || value.length > SIZE_LIMITS.values) {
		return { path, problem: 'not a list' };
	}
	const at = value.findIndex((item) => !fits(item));
	return at >= 0 ? { path: `${path}[${at}]`, problem } : null;
}

// null is a field not entered yet (the form shows it empty, the engine names it).
function isNumberOrBlank(value: unknown): boolean {
	return value === null || (typeof value === 'number' && Number.isFinite(value));
}

// Walks with its own stack: the caller has already bounded depth and size, but stays safe anyway.
function findKey(root: unknown, name: string): string | null {
	const stack: { value: unknown; path: string }[] = [{ value: root, path: '' }];
	while (stack.length > 0) {
		const { value, path } = stack.pop()!;
		if (typeof value !== 'object' || value === null) continue;
		if (Array.isArray(value)) {
			value.forEach((item, i) => stack.push({ value: item, path: `${path}[${i}]` }));
			continue;
		}
		for (const [key, inner] of Object.entries(value)) {
			const at = path ? `${path}.${key}` : key;
			if (key === name) return at;
			stack.push({ value: inner, path: at });
		}
	}
	return null;
}
