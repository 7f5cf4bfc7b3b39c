/**
 * Small readers for untrusted JSON values: each records an InputIssue at the given path instead
 * of throwing, and returns undefined when the value is unusable.
 */
import type { InputIssue } from '../model/issue';
import { SIZE_LIMITS, type Range } from './limits';

/** True for a plain object (not null, not an array). */
export function isRecord(value: unknown): value is Record<string, unknown> {
	return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** Appends an error issue. */
export function addError(issues: InputIssue[], path: string, code: string, message: string): void {
	issues.push({ path, code, message, severity: 'error' });
}

/** Appends a warning issue. */
export function addWarning(
	issues: InputIssue[],
	path: string,
	code: string,
	message: string
): void {
	issues.push({ path, code, message, severity: 'warning' });
}

/** Limits for `readNumber`. */
export interface NumberRule {
	/** Plain name and unit for messages, e.g. `span (m)`. */
	label: string;
	/** Smallest allowed value; `positive` means strictly above 0. */
	min?: number;
	positive?: boolean;
	/** Plausible range, inclusive (file units): see ./limits.ts. */
	range?: Range;
	/**
	 * Plausible range of the size |value| of a value that may also be zero or negative (loads).
	 * Below it a number carries no meaning on site, and ratios to it could overflow to Infinity.
	 */
	size?: Range;
}

/** A number as people read it in a message (no 17-digit tails). */
function show(value: number): string {
	return String(Number(value.toPrecision(6)));
}

/**
 * Reads a finite number, or records `not-a-number` / `not-positive` / `below-minimum` /
 * `out-of-range` / `too-small`.
 * @example readNumber('6', 'beam.spans[0]', issues, { label: 'span (m)' }) // undefined, 1 issue
 */
export function readNumber(
	value: unknown,
	path: string,
	issues: InputIssue[],
	rule: NumberRule
): number | undefined {
	if (typeof value !== 'number' || !Number.isFinite(value)) {
		addError(issues, path, 'not-a-number', `The ${rule.label} must be a number.`);
		return undefined;
	}
	if (rule.positive && !(value > 0)) {
		addError(issues, path, 'not-positive', `The ${rule.label} must be greater than zero.`);
		return undefined;
	}
	if (rule.min !== undefined && value < rule.min) {
		addError(issues, path, 'below-minimum', `The ${rule.label} must be at least ${rule.min}.`);
		return undefined;
	}
	if (rule.range && (value < rule.range[0] || value > rule.range[1])) {
		const [lo, hi] = rule.range;
		const message = `The ${rule.label} must be between ${lo} and ${hi}; got ${show(value)}.`;
		addError(issues, path, 'out-of-range', message);
		return undefined;
	}
	if (rule.size && value !== 0) {
		const [lo, hi] = rule.size;
		const size = Math.abs(value);
		if (size < lo) {
			const message = `The ${rule.label} is too small to mean anything: use 0 or at least ${lo}.`;
			addError(issues, path, 'too-small', message);
			return undefined;
		}
		if (size > hi) {
			const message = `The ${rule.label} must be between −${hi} and ${hi}; got ${show(value)}.`;
			addError(issues, path, 'out-of-range', message);
			return undefined;
		}
	}
	return value;
}

/** Reads text of at most `max` characters, or records `not-a-string` / `too-long`. */
export function readText(
	value: unknown,
	path: string,
	issues: InputIssue[],
	rule: { label: string; max: number }
): string | undefined {
	if (typeof value !== 'string') {
		addError(issues, path, 'not-a-string', `The ${rule.label} must be text.`);
		return undefined;
	}
	if (value.length > rule.max) {
		const got = value.length;
		const message = `The ${rule.label} must be at most ${rule.max} characters; got ${got}.`;
		addError(issues, path, 'too-long', message);
		return undefined;
	}
	return value;
}

/** Reads a list of at most `max` entries, or records `not-a-list` / `too-many`. */
export function readArray(
	value: unknown,
	path: string,
	issues: InputIssue[],
	rule: { label: string; max: number }
): unknown[] | undefined {
	if (!Array.isArray(value)) {
		addError(issues, path, 'not-a-list', `The ${rule.label} must be a list.`);
		return undefined;
	}
	if (value.length > rule.max) {
		const message = `At most ${rule.max} ${rule.label} are allowed; got ${value.length}.`;
		addError(issues, path, 'too-many', message);
		return undefined;
	}
	return value;
}

/** Reads one of a fixed set of strings, or records `not-one-of`. */
export function readChoice<T extends string>(
	value: unknown,
	path: string,
	issues: InputIssue[],
	choices: readonly T[],
	label: string
): T | undefined {
	const known = typeof value === 'string' && (choices as readonly string[]).includes(value);
	if (known) return value as T;
	addError(issues, path, 'not-one-of', `The ${label} must be one of: ${choices.join(', ')}.`);
	return undefined;
}

/** Warns about keys of an object that the format does not know. */
export function warnUnknownKeys(
	obj: Record<string, unknown>,
	known: readonly string[],
	prefix: string,
	issues: InputIssue[]
): void {
	for (const key of Object.keys(obj)) {
		if (known.includes(key)) continue;
		const cut = SIZE_LIMITS.keyShown;
		const shown = key.length > cut ? `${key.slice(0, cut)}…` : key;
		const path = prefix ? `${prefix}.${shown}` : shown;
		const message = `"${shown}" is not part of the case format and was ignored.`;
		addWarning(issues, path, 'unknown-key', message);
	}
}
