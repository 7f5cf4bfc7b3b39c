/**
 * Walks a report and throws if any number in it is NaN or infinite: no such value may reach a
 * person reading the result.
 */
import { assertFinite } from '../model/issue';

/**
 * Asserts every number in a plain data tree is finite; returns the tree unchanged.
 * @example assertAllFinite({ a: [1, 2] }, 'report') // { a: [1, 2] }
 */
export function assertAllFinite<T>(value: T, path: string): T {
	if (typeof value === 'number') assertFinite(value, path);
	else if (Array.isArray(value)) value.forEach((v, i) => assertAllFinite(v, `${path}[${i}]`));
	else if (value && typeof value === 'object')
		for (const [k, v] of Object.entries(value)) assertAllFinite(v, `${path}.${k}`);
	return value;
}
