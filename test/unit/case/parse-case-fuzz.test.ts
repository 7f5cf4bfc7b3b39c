/**
 * Bad input never throws: any JSON value, and a valid case with any one field replaced by any
 * JSON value (or NaN, ±Infinity, undefined), comes back as issues (each with a path) or as a
 * report — never as an exception.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../../src/lib/engine/case/index';
import { checkCase } from '../../../src/lib/engine/index';

/** A valid invented case (demo numbers). */
const valid = () => ({
	format: 'hingepoint.case',
	version: 1,
	title: 'DEMO — invented',
	beam: {
		spans: [5, 4],
		supports: ['pin', 'pin', 'free'],
		joints: ['continuous'],
		section: { designation: 'UB 305x165x40' },
		grade: 'S275',
		restraint: { lateral: [1, 2], loadHeight: 'top-flange' },
		bearing: [100, 100, 0]
	},
	loads: [
		{ kind: 'point', x: 2, value: 10, action: 'temporary' },
		{ kind: 'linear', from: 1, to: 8, start: 1, end: 2, action: 'imposed' }
	],
	factors: { permanent: 1.35, set: 'en1990-6.10' },
	deflectionLimit: 200
});

/** Every path to a leaf or object of a JSON value, as key lists. */
function listPaths(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
	const out: (string | number)[][] = prefix.length > 0 ? [prefix] : [];
	if (value && typeof value === 'object') {
		for (const [k, v] of Object.entries(value)) {
			out.push(...listPaths(v, [...prefix, Array.isArray(value) ? Number(k) : k]));
		}
	}
	return out;
}

function setPath(root: any, path: (string | number)[], v: unknown): void {
	let node = root;
	for (const key of path.slice(0, -1)) node = node[key];
	node[path[path.length - 1]] = v;
}

const PATHS = listPaths(valid());

describe('parseCase on broken input', () => {
	it('never throws on any JSON value', () => {
		fc.assert(
			fc.property(fc.jsonValue(), (json) => {
				const r = parseCase(json);
				expect(r.ok).toBe(false);
			})
		);
	});

	it('never throws when one field of a valid case is replaced; errors carry a path', () => {
		const notJson = fc.constantFrom(Number.NaN, Infinity, -Infinity, undefined);
		fc.assert(
			fc.property(fc.constantFrom(...PATHS), fc.oneof(fc.jsonValue(), notJson), (path, v) => {
				const c = valid();
				setPath(c, path, v);
				const r = checkCase(c);
				if (!r.ok) {
					expect(r.issues.length).toBeGreaterThan(0);
					for (const i of r.issues) expect(typeof i.path).toBe('string');
				}
			}),
			{ numRuns: 400 }
		);
	});
});
