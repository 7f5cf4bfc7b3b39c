/**
 * Reads the loads of a case file (m, kN, kN/m) into internal loads (mm, N, N/mm).
 */
import type { InputIssue } from '../model/issue';
import type { Load } from '../model/types';
import { kNPerMToNPerMm, kNToN, mToMm } from '../units';
import { RANGES, SIZE_LIMITS } from './limits';
import {
	addError,
	addWarning,
	isRecord,
	readArray,
	readChoice,
	readNumber,
	readText,
	warnUnknownKeys
} from './read-value';
import type { CaseAction } from './types';

const ACTIONS: readonly CaseAction[] = ['permanent', 'imposed', 'temporary'];
/** Keys of each kind of load in the file. */
export const LOAD_KEYS: Record<Load['kind'], readonly string[]> = {
	point: ['kind', 'x', 'value', 'action', 'label'],
	uniform: ['kind', 'from', 'to', 'value', 'action', 'label'],
	linear: ['kind', 'from', 'to', 'start', 'end', 'action', 'label']
};

/**
 * Validates every load against the beam (spans in m); returns loads and labels in file order.
 * @example parseLoads([{ kind: 'point', x: 2, value: 12.5, action: 'temporary' }], [6], issues)
 */
export function parseLoads(
	value: unknown,
	spans: number[] | undefined,
	issues: InputIssue[]
): { loads: Load[]; labels: (string | null)[] } | undefined {
	if (!Array.isArray(value)) {
		addError(issues, 'loads', 'not-a-list', 'The loads must be a list (it may be empty).');
		return undefined;
	}
	const list = readArray(value, 'loads', issues, { label: 'loads', max: SIZE_LIMITS.loads });
	if (!list) return undefined;
	const before = issues.filter((i) => i.severity === 'error').length;
	const loads: Load[] = [];
	const labels: (string | null)[] = [];
	const length = spans ? measureBeam(spans) : undefined;
	list.forEach((raw, i) => {
		const load = parseLoad(raw, `loads[${i}]`, length, issues);
		const label = readLabel(raw, `loads[${i}].label`, issues);
		if (load && label !== undefined) {
			loads.push(load);
			labels.push(label);
		}
	});
	const after = issues.filter((i) => i.severity === 'error').length;
	return after > before ? undefined : { loads, labels };
}

/** The optional label of a load: text of at most 80 characters, null when absent. */
function readLabel(raw: unknown, path: string, issues: InputIssue[]): string | null | undefined {
	if (!isRecord(raw) || raw.label === undefined) return null;
	return readText(raw.label, path, issues, { label: 'load label', max: SIZE_LIMITS.label });
}

/** Beam length in m and in mm (the mm sum is the one the model's nodes use). */
interface BeamLength {
	m: number;
	mm: number;
}

/** Length of a beam of spans in m, in m and in mm. */
export function measureBeam(spans: number[]): BeamLength {
	return { m: spans.reduce((s, L) => s + L, 0), mm: spans.reduce((s, L) => s + mToMm(L), 0) };
}

/**
 * A position in m checked against the beam, returned in mm. Sums of spans in m carry round-off
 * (8.1 + 1.2 = 9.2999…), so the ends are matched within 1e-9 relative and snapped to the beam.
 */
export function readPosition(
	v: unknown,
	path: string,
	length: BeamLength | undefined,
	issues: InputIssue[],
	code = 'load-off-beam'
): number | undefined {
	const x = readNumber(v, path, issues, { label: 'position (m)' });
	if (x === undefined || length === undefined) return x === undefined ? undefined : mToMm(x);
	const tol = 1e-9 * Math.max(1, length.m);
	if (x < -tol || x > length.m + tol) {
		const shown = Number(length.m.toPrecision(10));
		const message = `The position ${x} m is off the beam, which runs from 0 to ${shown} m.`;
		addError(issues, path, code, message);
		return undefined;
	}
	return Math.min(Math.max(mToMm(x), 0), length.mm);
}

function parseLoad(
	raw: unknown,
	path: string,
	length: BeamLength | undefined,
	issues: InputIssue[]
): Load | undefined {
	if (!isRecord(raw)) {
		const message = 'Each load must be an object with kind, position, value and action.';
		addError(issues, path, 'not-an-object', message);
		return undefined;
	}
	const kinds = ['point', 'uniform', 'linear'] as const;
	const kind = readChoice(raw.kind, `${path}.kind`, issues, kinds, 'load kind');
	const action = readChoice(raw.action, `${path}.action`, issues, ACTIONS, 'action');
	if (!kind) return undefined;
	warnUnknownKeys(raw, LOAD_KEYS[kind], path, issues);
	const onBeam = (v: unknown, key: string): number | undefined =>
		readPosition(v, `${path}.${key}`, length, issues);
	const force = (key: string, label: string): number | undefined => {
		const rule = { label, size: kind === 'point' ? RANGES.pointLoad : RANGES.lineLoad };
		const v = readNumber(raw[key], `${path}.${key}`, issues, rule);
		if (v !== undefined && v < 0) {
			const message = 'A negative value acts upward; check that is intended.';
			addWarning(issues, `${path}.${key}`, 'load-upward', message);
		}
		return v;
	};
	if (kind === 'point') {
		const x = onBeam(raw.x, 'x');
		const value = force('value', 'load (kN)');
		if (x === undefined || value === undefined || !action) return undefined;
		return { kind, x, value: kNToN(value), action };
	}
	const from = onBeam(raw.from, 'from');
	const to = onBeam(raw.to, 'to');
	if (from !== undefined && to !== undefined && !(to > from)) {
		const [a, b] = [from / 1000, to / 1000];
		const message = `"to" (${b} m) must be greater than "from" (${a} m).`;
		addError(issues, `${path}.to`, 'range-empty', message);
		return undefined;
	}
	if (kind === 'uniform') {
		const value = force('value', 'line load (kN/m)');
		if (from === undefined || to === undefined || value === undefined || !action) return undefined;
		return { kind, from, to, value: kNPerMToNPerMm(value), action };
	}
	const start = force('start', 'line load at "from" (kN/m)');
	const end = force('end', 'line load at "to" (kN/m)');
	if (from === undefined || to === undefined || start === undefined || end === undefined) {
		return undefined;
	}
	if (!action) return undefined;
	return { kind, from, to, start: kNPerMToNPerMm(start), end: kNPerMToNPerMm(end), action };
}
