/**
 * Checks that try many trial loads read an arrangement's moment and shear at fixed points from
 * sums made once per arrangement (`point-effects.ts`). Elastic effects superpose, so those sums
 * are the same numbers as combining the groups at every read (`LoadEffects.fixedAt` and
 * `variableAt`); the sums run in the same order, so they must agree to the last bit on random
 * beams (invented: one to four spans, pinned, built-in or free ends, patterned imposed load,
 * EN 1990 6.10a/b arrangements).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { resolveFactors } from '../../src/lib/engine/checks/en1993/factors';
import { listLoadArrangements } from '../../src/lib/engine/checks/load-arrangements';
import { analyseLoadGroups } from '../../src/lib/engine/checks/load-effects';
import { preparePointEffects } from '../../src/lib/engine/checks/point-effects';
import { findMechanismIssues } from '../../src/lib/engine/elastic/index';
import type { BeamLine, Load, SupportKind } from '../../src/lib/engine/model/types';

const caseArb = fc.record({
	spans: fc.array(fc.integer({ min: 1500, max: 9000 }), { minLength: 1, maxLength: 4 }),
	left: fc.constantFrom<SupportKind>('pin', 'fixed', 'free'),
	right: fc.constantFrom<SupportKind>('pin', 'fixed', 'free'),
	g: fc.integer({ min: 0, max: 15 }),
	imposed: fc.array(fc.tuple(fc.nat(), fc.integer({ min: 1, max: 20 })), { maxLength: 4 }),
	points: fc.array(
		fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.integer({ min: -10, max: 60 })),
		{ minLength: 1, maxLength: 5 }
	),
	reads: fc.array(fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.boolean()), {
		minLength: 1,
		maxLength: 8
	})
});

describe('point effects summed once per arrangement', () => {
	it('equal the groups combined at every read, bit for bit, on 200 random beams', () => {
		let compared = 0;
		fc.assert(
			fc.property(caseArb, (s) => {
				const n = s.spans.length;
				const supports = [s.left, ...s.spans.slice(1).map(() => 'pin' as const), s.right];
				const beam: BeamLine = {
					spans: s.spans,
					supports,
					joints: s.spans.slice(1).map(() => 'continuous')
				};
				if (findMechanismIssues(beam).length > 0) return;
				const nodes = [0];
				for (const L of s.spans) nodes.push(nodes[nodes.length - 1] + L);
				const total = nodes[n];
				const loads: Load[] = [];
				if (s.g)
					loads.push({ kind: 'uniform', from: 0, to: total, value: s.g, action: 'permanent' });
				const imposedSpans = new Set<number>();
				for (const [i, q] of s.imposed) {
					const k = i % n;
					imposedSpans.add(k);
					loads.push({
						kind: 'uniform',
						from: nodes[k],
						to: nodes[k + 1],
						value: q,
						action: 'imposed'
					});
				}
				for (const [t, kN] of s.points) {
					if (kN !== 0)
						loads.push({ kind: 'point', x: t * total, value: kN * 1e3, action: 'temporary' });
				}
				const effects = analyseLoadGroups({ beam, EI: s.spans.map(() => 2e13), loads });
				const factors = resolveFactors(
					{ set: 'en1990-6.10ab' },
					{ hasImposed: imposedSpans.size > 0 }
				);
				const arrangements = listLoadArrangements({
					combinations: factors.combinations,
					spanCount: n,
					imposedSpans: [...imposedSpans].sort((a, b) => a - b)
				});
				const points = s.reads.map(([f, left]) => ({
					x: f * total,
					side: left ? ('left' as const) : ('right' as const)
				}));
				const read = preparePointEffects(effects, points);
				for (const arr of arrangements) {
					const e = read(arr);
					points.forEach((p, i) => {
						const fixed = effects.fixedAt(arr, p.x, p.side);
						const variable = effects.variableAt(arr, p.x, p.side);
						expect(e.fixedM[i]).toBe(fixed.M);
						expect(e.fixedV[i]).toBe(fixed.V);
						expect(e.variableM[i]).toBe(variable.M);
						expect(e.variableV[i]).toBe(variable.V);
					});
				}
				compared++;
			}),
			{ numRuns: 200, seed: 20261202 }
		);
		expect(compared).toBeGreaterThan(100);
	});
});
