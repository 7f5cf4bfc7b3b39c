/**
 * Reads the beam geometry of a case file (spans in m, supports, joints) into a BeamLine in mm.
 */
import type { InputIssue } from '../model/issue';
import { validateBeamLine } from '../model/validate-beam';
import type { BeamLine, JointKind, SupportKind } from '../model/types';
import { mToMm } from '../units';
import { RANGES, SIZE_LIMITS } from './limits';
import { addError, readArray, readChoice, readNumber } from './read-value';

const SUPPORTS: readonly SupportKind[] = ['pin', 'fixed', 'free'];
const JOINTS: readonly JointKind[] = ['continuous', 'simple'];

/**
 * Validates spans, supports and joints; returns the beam line in mm when all are usable.
 * @example
 * parseGeometry({ spans: [6], supports: ['pin', 'pin'] }, issues) // { spans: [6000], … }
 */
export function parseGeometry(
	beam: Record<string, unknown>,
	issues: InputIssue[]
): BeamLine | undefined {
	const before = issues.length;
	const spans = readSpans(beam.spans, issues);
	// List lengths can be checked even when a span value is wrong.
	const count = Array.isArray(beam.spans) ? beam.spans.length : 0;
	if (count > SIZE_LIMITS.spans) return undefined;
	const n = count > 0 ? count : undefined;
	const supportCount = n === undefined ? undefined : n + 1;
	const supports = readList(beam.supports, 'beam.supports', supportCount, issues, (v, p) =>
		readChoice(v, p, issues, SUPPORTS, 'support')
	);
	const joints = readJoints(beam.joints, n, issues);
	if (!spans || !supports || !joints || issues.length > before) return undefined;
	supports.forEach((kind, i) => {
		if (kind !== 'free' || i === 0 || i === supports.length - 1) return;
		const message = 'Only the two ends of the beam may be free.';
		addError(issues, `beam.supports[${i}]`, 'free-inside', message);
	});
	if (supports.length === 2 && supports.every((s) => s === 'free'))
		addError(issues, 'beam.supports', 'no-support', 'The beam needs at least one support.');
	if (issues.length > before) return undefined;
	const line: BeamLine = { spans: spans.map(mToMm), supports, joints };
	// The same test the solvers rely on: a beam that is a mechanism under its own supports is an
	// input problem here, before any solve.
	const found = validateBeamLine(line);
	issues.push(...found);
	return found.some((i) => i.severity === 'error') ? undefined : line;
}

/** Joints as given, or all continuous when omitted. */
function readJoints(
	value: unknown,
	n: number | undefined,
	issues: InputIssue[]
): JointKind[] | undefined {
	if (n === undefined) return undefined;
	if (value === undefined) return new Array<JointKind>(Math.max(0, n - 1)).fill('continuous');
	const readJoint = (v: unknown, p: string) => readChoice(v, p, issues, JOINTS, 'joint');
	return readList(value, 'beam.joints', n - 1, issues, readJoint);
}

function readSpans(value: unknown, issues: InputIssue[]): number[] | undefined {
	if (!Array.isArray(value) || value.length === 0) {
		const message = 'Give the span lengths in m as a list, e.g. [6.0].';
		addError(issues, 'beam.spans', 'spans-missing', message);
		return undefined;
	}
	const list = readArray(value, 'beam.spans', issues, { label: 'spans', max: SIZE_LIMITS.spans });
	if (!list) return undefined;
	const rule = { label: 'span (m)', range: RANGES.span };
	const out = list.map((v, i) => readNumber(v, `beam.spans[${i}]`, issues, rule));
	return out.every((v): v is number => v !== undefined) ? out : undefined;
}

function readList<T>(
	value: unknown,
	path: string,
	length: number | undefined,
	issues: InputIssue[],
	readItem: (v: unknown, p: string) => T | undefined
): T[] | undefined {
	if (!Array.isArray(value)) {
		addError(issues, path, 'not-a-list', 'This must be a list.');
		return undefined;
	}
	if (length === undefined && value.length > SIZE_LIMITS.spans + 1) {
		const message = `At most ${SIZE_LIMITS.spans + 1} entries (${SIZE_LIMITS.spans} spans).`;
		addError(issues, path, 'too-many', message);
		return undefined;
	}
	if (length !== undefined && value.length !== length) {
		const what = path.endsWith('supports')
			? 'one support per node (spans + 1)'
			: 'one joint per internal node (spans − 1)';
		const message = `Expected ${length} entries: ${what}; got ${value.length}.`;
		addError(issues, path, 'wrong-length', message);
		return undefined;
	}
	const out = value.map((v, i) => readItem(v, `${path}[${i}]`));
	return out.every((v): v is T => v !== undefined) ? out : undefined;
}
