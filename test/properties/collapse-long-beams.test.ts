/**
 * Long beam lines (40 to 50 spans) with mixed supports — pinned, fixed or free ends, fixed
 * interior supports and simple joints — never make the collapse solver throw: the answer is
 * either certified by matching bounds (static and kinematic theorems, Neal, "The Plastic
 * Methods of Structural Analysis") or says plainly that it is not proved. Loads and sections
 * are invented.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solveCollapse, validateCollapseProblem } from '../../src/lib/engine/collapse/index';
import type { CollapseProblem } from '../../src/lib/engine/collapse/types';
import type { JointKind, Load, SupportKind } from '../../src/lib/engine/model/types';

const arbitraryLongBeam = fc
	.record({
		n: fc.integer({ min: 40, max: 50 }),
		spanMm: fc.array(fc.integer({ min: 600, max: 3000 }), { minLength: 50, maxLength: 50 }),
		left: fc.constantFrom<SupportKind>('pin', 'fixed', 'free'),
		right: fc.constantFrom<SupportKind>('pin', 'fixed'),
		interiorFixed: fc.array(fc.boolean(), { minLength: 50, maxLength: 50 }),
		simple: fc.array(fc.integer({ min: 0, max: 9 }), { minLength: 50, maxLength: 50 }),
		mp: fc.array(fc.integer({ min: 50, max: 300 }), { minLength: 50, maxLength: 50 }),
		w: fc.integer({ min: 0, max: 20 }),
		q: fc.integer({ min: 1, max: 20 }),
		points: fc.array(
			fc.tuple(fc.double({ min: 0.01, max: 0.99, noNaN: true }), fc.integer({ min: 1, max: 50 })),
			{
				maxLength: 6
			}
		)
	})
	.map((s): CollapseProblem => {
		const spans = s.spanMm.slice(0, s.n);
		const supports: SupportKind[] = spans.map((_, i) =>
			i === 0 ? s.left : s.interiorFixed[i] ? 'fixed' : 'pin'
		);
		supports.push(s.right);
		// About one joint in ten is simple; never next to a free end (that would be a mechanism).
		const joints: JointKind[] = spans
			.slice(1)
			.map((_, k) =>
				s.simple[k] === 0 && !(k === 0 && s.left === 'free') ? 'simple' : 'continuous'
			);
		const total = spans.reduce((a, b) => a + b, 0);
		const nodes = [0];
		for (const L of spans) nodes.push(nodes[nodes.length - 1] + L);
		const fixedLoads: Load[] = s.w
			? [{ kind: 'uniform', from: 0, to: total, value: s.w, action: 'permanent' }]
			: [];
		const variableLoads: Load[] = [
			{ kind: 'uniform', from: 0, to: total, value: s.q, action: 'temporary' },
			...s.points.map(([t, kN]): Load => ({
				kind: 'point',
				x: t * total,
				value: kN * 1e3,
				action: 'temporary'
			}))
		];
		return {
			beam: { spans, supports, joints },
			capacity: spans.map((_, i) => ({
				from: nodes[i],
				to: nodes[i + 1],
				sagging: s.mp[i] * 1e6,
				hogging: s.mp[i] * 1e6
			})),
			fixedLoads,
			variableLoads
		};
	})
	.filter((p) => validateCollapseProblem(p).every((i) => i.severity !== 'error'));

describe('long beam lines', () => {
	it('are certified by matching bounds or say plainly that they are not proved', () => {
		fc.assert(
			fc.property(arbitraryLongBeam, (p) => {
				const r = solveCollapse(p);
				expect(['mechanism', 'not-certified', 'fails-under-fixed', 'unbounded']).toContain(
					r.status
				);
				if (r.status === 'mechanism') {
					expect(r.certified).toBe(true);
					expect(r.gap).toBeLessThanOrEqual(1e-6);
					expect(r.lowerBound).toBeLessThanOrEqual(r.upperBound * (1 + 1e-9));
				}
				if (r.status === 'not-certified') expect(r.message).toMatch(/certified|not/i);
			}),
			{ numRuns: 6 }
		);
	});
});
