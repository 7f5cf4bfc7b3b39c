/**
 * No NaN or Infinity ever leaves the collapse solver, for any valid beam (engine rule: every
 * number entering a result is finite).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solveCollapse } from '../../src/lib/engine/collapse';
import { arbitraryBeamSpec } from '../unit/collapse/arbitraries';
import { makeProblem } from '../unit/collapse/builders';

/** Every number reachable in a plain object. */
function collectNumbers(value: unknown, out: number[] = []): number[] {
	if (typeof value === 'number') out.push(value);
	else if (Array.isArray(value)) value.forEach((v) => collectNumbers(v, out));
	else if (value && typeof value === 'object')
		Object.values(value).forEach((v) => collectNumbers(v, out));
	return out;
}

describe('finite results', () => {
	it('solveCollapse returns only finite numbers and a known status', () => {
		fc.assert(
			fc.property(arbitraryBeamSpec({ interiorFixed: true }), (spec) => {
				const r = solveCollapse(makeProblem(spec));
				expect(['mechanism', 'not-certified', 'fails-under-fixed', 'unbounded']).toContain(
					r.status
				);
				expect(collectNumbers(r).every(Number.isFinite)).toBe(true);
				if (r.status === 'mechanism') expect(r.loadFactor).toBeGreaterThanOrEqual(0);
			}),
			{ numRuns: 80, seed: 777 }
		);
	});
});
