/**
 * Small readers for untrusted JSON values: each records an InputIssue at the given path instead
 * of throwing, and returns undefined when the value is unusable.
 */
import type { InputIssue } from '../model/issue';

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
	/** Largest allowed size |value|: a plausibility bound that keeps results finite. */
	maxAbs?: number;
	/**
	 * Smallest size a non-zero value may have. Below it a number carries no meaning on site, and
	 * ratios to it (e.g. allowed load ÷ entered load) could overflow to Infinity.
	 */
	minAbs?: number;
}

/**
 * Plausibility bounds of case-file numbers (our choice, not code values): far beyond any beam
 * this tool can judge, yet small enough that no product of them overflows to Infinity.
 */
export const PLAUSIBLE = {
	/** Span, m. */
	span: 1000,
	/** Shortest span, m. */
	spanMin: 0.01,
	/** Point load (kN) or line load (kN/m). */
	load: 1e6,
	/** Smallest non-zero load, kN or kN/m (1 N). */
	loadMin: 1e-3,
	/** Partial factor or combination value. */
	factor: 100,
	/** Smallest non-zero partial factor or combination value. */
	factorMin: 1e-3,
	/** Length in mm (bearing). */
	length: 1e5
} as const;

/**
 * Reads a finite number, or records `not-a-number` / `not-positive` / `below-minimum`.
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
	if (rule.minAbs !== undefined && value !== 0 && Math.abs(value) < rule.minAbs) {
		const message = `The ${rule.label} is too small to mean anything: use 0 or at least ${rule.minAbs}.`;
		addError(issues, path, 'too-small', message);
		return undefined;
	}
	if (rule.maxAbs !== undefined && Math.abs(value) > rule.maxAbs) {
		const message = `The ${rule.label} must not exceed ${rule.maxAbs} in size.`;
		addError(issues, path, 'out-of-range', message);
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
		const path = prefix ? `${prefix}.${key}` : key;
		const message = `"${key}" is not part of the case format and was ignored.`;
		addWarning(issues, path, 'unknown-key', message);
	}
}
