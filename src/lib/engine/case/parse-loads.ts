/**
 * Reads the loads of a case file (m, kN, kN/m) into internal loads (mm, N, N/mm).
 */
import type { InputIssue } from '../model/issue';
import type { Load } from '../model/types';
import { kNPerMToNPerMm, kNToN, mToMm } from '../units';
import { addError, addWarning, isRecord, readChoice, readNumber, warnUnknownKeys } from './read-value';
import type { CaseAction } from './types';

const ACTIONS: readonly CaseAction[] = ['permanent', 'imposed', 'temporary'];
const KEYS: Record<Load['kind'], readonly string[]> = {
	point: ['kind', 'x', 'value', 'action', 'label'],
	uniform: ['kind', 'from', 'to', 'value', 'action', 'label'],
	linear: ['kind', 'from', 'to', 'start', 'end', 'action', 'label']
};

/**
 * Validates every load against the beam length (m); returns loads and labels in file order.
 * @example parseLoads([{ kind: 'point', x: 2, value: 12.5, action: 'temporary' }], 6, issues)
 */
export function parseLoads(
	value: unknown,
	length: number | undefined,
	issues: InputIssue[]
): { loads: Load[]; labels: (string | null)[] } | undefined {
	if (!Array.isArray(value)) {
		addError(issues, 'loads', 'not-a-list', 'The loads must be a list (it may be empty).');
		return undefined;
	}
	const before = issues.filter((i) => i.severity === 'error').length;
	const loads: Load[] = [];
	const labels: (string | null)[] = [];
	value.forEach((raw, i) => {
		const load = parseLoad(raw, `loads[${i}]`, length, issues);
		if (load) {
			loads.push(load);
			labels.push(isRecord(raw) && typeof raw.label === 'string' ? raw.label : null);
		}
	});
	const after = issues.filter((i) => i.severity === 'error').length;
	return after > before ? undefined : { loads, labels };
}

function parseLoad(raw: unknown, path: string, length: number | undefined, issues: InputIssue[]): Load | undefined {
	if (!isRecord(raw)) {
		addError(issues, path, 'not-an-object', 'Each load must be an object with kind, position, value and action.');
		return undefined;
	}
	const kind = readChoice(raw.kind, `${path}.kind`, issues, ['point', 'uniform', 'linear'] as const, 'load kind');
	const action = readChoice(raw.action, `${path}.action`, issues, ACTIONS, 'action');
	if (!kind) return undefined;
	warnUnknownKeys(raw, KEYS[kind], path, issues);
	const onBeam = (v: unknown, key: string): number | undefined => {
		const x = readNumber(v, `${path}.${key}`, issues, { label: 'position (m)' });
		if (x === undefined || length === undefined) return x;
		if (x < 0 || x > length) {
			const msg = `The position ${x} m is off the beam, which runs from 0 to ${length} m.`;
			addError(issues, `${path}.${key}`, 'load-off-beam', msg);
			return undefined;
		}
		return x;
	};
	const force = (key: string, label: string): number | undefined => {
		const v = readNumber(raw[key], `${path}.${key}`, issues, { label });
		if (v !== undefined && v < 0)
			addWarning(issues, `${path}.${key}`, 'load-upward', 'A negative value acts upward; check that is intended.');
		return v;
	};
	if (kind === 'point') {
		const x = onBeam(raw.x, 'x');
		const value = force('value', 'load (kN)');
		if (x === undefined || value === undefined || !action) return undefined;
		return { kind, x: mToMm(x), value: kNToN(value), action };
	}
	const from = onBeam(raw.from, 'from');
	const to = onBeam(raw.to, 'to');
	if (from !== undefined && to !== undefined && !(to > from)) {
		addError(issues, `${path}.to`, 'range-empty', `"to" (${to} m) must be greater than "from" (${from} m).`);
		return undefined;
	}
	if (kind === 'uniform') {
		const value = force('value', 'line load (kN/m)');
		if (from === undefined || to === undefined || value === undefined || !action) return undefined;
		return { kind, from: mToMm(from), to: mToMm(to), value: kNPerMToNPerMm(value), action };
	}
	const start = force('start', 'line load at "from" (kN/m)');
	const end = force('end', 'line load at "to" (kN/m)');
	if (from === undefined || to === undefined || start === undefined || end === undefined || !action) return undefined;
	return { kind, from: mToMm(from), to: mToMm(to), start: kNPerMToNPerMm(start), end: kNPerMToNPerMm(end), action };
}
