/** Keys that could reach an object's prototype if some code ever merged the data naively. */
const HOSTILE_KEYS = new Set(['__proto__', 'constructor', 'prototype']);

/** Deeper than any case or report we write; deeper means the file is not ours. */
export const MAX_BACKUP_DEPTH = 64;

/**
 * Walks parsed JSON without recursion (a hostile file cannot overflow the stack) and names the
 * first thing no backup of ours contains: a prototype-reaching key, or nesting past the limit.
 * Returns null when the data is safe to read further.
 * @example
 * findHostileShape(JSON.parse('{"__proto__": {}}')) // 'a key named “__proto__”'
 */
export function findHostileShape(data: unknown): string | null {
	const stack: { value: unknown; depth: number }[] = [{ value: data, depth: 0 }];
	while (stack.length > 0) {
		const { value, depth } = stack.pop()!;
		if (typeof value !== 'object' || value === null) continue;
		if (depth > MAX_BACKUP_DEPTH) return `nesting deeper than ${MAX_BACKUP_DEPTH} levels`;
		for (const key of Object.keys(value)) {
			if (HOSTILE_KEYS.has(key)) return `a key named “${key}”`;
			stack.push({ value: (value as Record<string, unknown>)[key], depth: depth + 1 });
		}
	}
	return null;
}
