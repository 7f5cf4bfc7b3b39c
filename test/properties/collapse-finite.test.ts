/**
 * No NaN or Infinity ever leaves the collapse solver or the capacity curve, for any valid beam
 * (engine rule: every number entering a result is finite). Also: the minimum of the capacity
 * curve is a solve in its own right — a single point load at that x collapses at P_max (static
 * and kinematic theorems, Neal; Horne, from memory) and no sampled point of the curve is lower.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeCapacityCurve, solveCollapse } from '../../src/lib/engine/collapse';
import { arbitraryBeamSpec } from '../unit/collapse/arbitraries';
import { makeProblem, relativeError } from '../unit/collapse/builders';

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

describe('capacity curve', () => {
	it('its minimum equals solveCollapse with the point load at that x, and lies below every point', () => {
		fc.assert(
			fc.property(arbitraryBeamSpec({ interiorFixed: true, upward: false }), (spec) => {
				const problem = makeProblem(spec);
				const curve = computeCapacityCurve({
					beam: problem.beam,
					capacity: problem.capacity,
					fixedLoads: problem.fixedLoads
				});
				expect(collectNumbers(curve).every(Number.isFinite)).toBe(true);
				if (curve.status !== 'ok') return;
				const { x, Pmax } = curve.minimum;
				const check = solveCollapse({
					...problem,
					variableLoads: [{ kind: 'point', x, value: 1, action: 'temporary' }]
				});
				expect(check.status).toBe('mechanism');
				if (check.status === 'mechanism')
					expect(relativeError(check.loadFactor, Pmax)).toBeLessThan(1e-9);
				for (const p of curve.points)
					if (p.Pmax !== null) expect(p.Pmax).toBeGreaterThanOrEqual(Pmax * (1 - 1e-9));
			}),
			{ numRuns: 12, seed: 99 }
		);
	});
});
