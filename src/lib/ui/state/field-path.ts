/**
 * Reading and writing a value inside the case by its field path, the same path the engine names
 * in its input issues (`beam.spans[1]`, `loads[0].x`, `beam.section.tf`).
 */

const SEGMENT = /([^.[\]]+)|\[(\d+)\]/g;

/**
 * Splits a field path into keys and indices.
 * @example
 * splitPath('loads[2].x') // ['loads', 2, 'x']
 */
export function splitPath(path: string): (string | number)[] {
	const parts: (string | number)[] = [];
	for (const match of path.matchAll(SEGMENT)) {
		parts.push(match[2] !== undefined ? Number(match[2]) : match[1]);
	}
	return parts;
}

/**
 * The value at a path, or undefined when any step is missing.
 * @example
 * readPath({ loads: [{ x: 2 }] }, 'loads[0].x') // 2
 */
export function readPath(root: unknown, path: string): unknown {
	let node: unknown = root;
	for (const key of splitPath(path)) {
		if (node === null || typeof node !== 'object') return undefined;
		node = (node as Record<string | number, unknown>)[key];
	}
	return node;
}

/**
 * Writes a value at a path, creating plain objects for missing steps.
 * @example
 * writePath(c, 'beam.bearing.supports', 100)
 */
export function writePath(root: object, path: string, value: unknown): void {
	const keys = splitPath(path);
	let node = root as Record<string | number, unknown>;
	for (const key of keys.slice(0, -1)) {
		if (node[key] === null || typeof node[key] !== 'object') node[key] = {};
		node = node[key] as Record<string | number, unknown>;
	}
	node[keys[keys.length - 1]] = value;
}

/**
 * Renumbers keys like `loads[3].x` after item `removed` of the list `list` is taken out: keys of
 * that item are dropped, later items move down by one.
 * @example
 * shiftListKeys({ 'loads[2].x': '4' }, 'loads', 1) // { 'loads[1].x': '4' }
 */
export function shiftListKeys<T>(
	record: Record<string, T>,
	list: string,
	removed: number
): Record<string, T> {
	const pattern = new RegExp(`^${list.replace(/[.[\]]/g, '\\$&')}\\[(\\d+)\\](.*)$`);
	const out: Record<string, T> = {};
	for (const [key, value] of Object.entries(record)) {
		const match = pattern.exec(key);
		if (!match) {
			out[key] = value;
			continue;
		}
		const index = Number(match[1]);
		if (index === removed) continue;
		out[index > removed ? `${list}[${index - 1}]${match[2]}` : key] = value;
	}
	return out;
}
