/**
 * Bounds the shape of untrusted JSON before anything walks it recursively: nesting depth and the
 * number of values, and only the kinds of value JSON.parse makes. Walks with its own stack, so a
 * value nested 10 000 deep cannot overflow.
 */
import type { InputIssue } from '../model/issue';
import { SIZE_LIMITS } from './limits';
import { addError } from './read-value';

/** A value JSON.parse could have made: no functions, symbols, class instances or extra keys. */
function isJsonLike(value: unknown): boolean {
	if (value === null || value === undefined) return true;
	const t = typeof value;
	if (t === 'string' || t === 'number' || t === 'boolean') return true;
	if (t !== 'object') return false;
	if (Array.isArray(value)) return Object.keys(value).length === value.length;
	const proto = Object.getPrototypeOf(value);
	return proto === Object.prototype || proto === null;
}

/**
 * Records `not-json`, `too-deep` or `too-large` when the JSON value exceeds the case-file limits.
 * @example checkJsonShape({ a: { b: { c: 1 } } }, issues) // true, no issue
 */
export function checkJsonShape(json: unknown, issues: InputIssue[]): boolean {
	const stack: { value: unknown; depth: number; path: string }[] = [
		{ value: json, depth: 0, path: '' }
	];
	let count = 0;
	while (stack.length > 0) {
		const { value, depth, path } = stack.pop()!;
		count += 1;
		if (count + stack.length > SIZE_LIMITS.values) {
			const message = `The case file is too large: at most ${SIZE_LIMITS.values} values.`;
			addError(issues, '', 'too-large', message);
			return false;
		}
		if (!isJsonLike(value)) {
			const message = 'Only JSON values: text, numbers, true/false, null, lists and objects.';
			addError(issues, path, 'not-json', message);
			return false;
		}
		if (typeof value !== 'object' || value === null) continue;
		if (depth >= SIZE_LIMITS.depth) {
			const message = `Nested too deep: at most ${SIZE_LIMITS.depth} levels of objects and lists.`;
			addError(issues, path, 'too-deep', message);
			return false;
		}
		const entries = Array.isArray(value) ? value.entries() : Object.entries(value);
		for (const [key, child] of entries) {
			const at = Array.isArray(value) ? `${path}[${key}]` : path ? `${path}.${key}` : `${key}`;
			stack.push({ value: child, depth: depth + 1, path: at.slice(0, 200) });
		}
	}
	return true;
}
