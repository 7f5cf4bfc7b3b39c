/**
 * The elastic bending row combines each load group's moment, fitted once as exact cubic pieces,
 * for every load arrangement (elastic analysis is linear: superposition). It must agree with
 * analysing every arrangement afresh — the exhaustive way, kept in bending-check.ts — on random
 * beams: same governing multiplier to 1e-9, same utilisations, same verdict of the row.
 * Arrangements and factors: EN 1990 6.10 and 6.10a/b with imposed load patterned span by span.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	checkElasticBending,
	checkElasticBendingByReanalysis
} from '../../src/lib/engine/checks/bending-check';
import type { CheckContext } from '../../src/lib/engine/checks/context';
import { en1993 } from '../../src/lib/engine/checks/en1993/index';
import { listLoadArrangements } from '../../src/lib/engine/checks/load-arrangements';
import { analyseLoadGroups } from '../../src/lib/engine/checks/load-effects';
import { findMechanismIssues } from '../../src/lib/engine/elastic/index';
import type { BeamLine, Load, SupportKind } from '../../src/lib/engine/model/types';
import { expectRel } from '../support/expect-rel';

const arbitraryCase = fc
	.record({
		spans: fc.array(fc.integer({ min: 1500, max: 9000 }), { minLength: 1, maxLength: 3 }),
		left: fc.constantFrom<SupportKind>('pin', 'fixed', 'free'),
		right: fc.constantFrom<SupportKind>('pin', 'fixed', 'free'),
		EI: fc.array(fc.integer({ min: 5, max: 50 }), { minLength: 4, maxLength: 4 }),
		limit: fc.array(fc.integer({ min: 50, max: 400 }), { minLength: 4, maxLength: 4 }),
		g: fc.integer({ min: 0, max: 15 }),
		imposed: fc.array(fc.tuple(fc.integer({ min: 0, max: 3 }), fc.integer({ min: 1, max: 20 })), {
			maxLength: 4
		}),
		points: fc.array(
			fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.integer({ min: -10, max: 60 })),
			{ minLength: 1, maxLength: 5 }
		),
		linear: fc.option(fc.tuple(fc.integer({ min: 0, max: 10 }), fc.integer({ min: 0, max: 10 }))),
		set: fc.constantFrom('en1990-6.10', 'en1990-6.10ab')
	})
	.map((s) => {
		const n = s.spans.length;
		const supports: SupportKind[] = [
			s.left,
			...s.spans.slice(1).map(() => 'pin' as const),
			s.right
		];
		const beam: BeamLine = {
			spans: s.spans,
			supports,
			joints: s.spans.slice(1).map(() => 'continuous')
		};
		const nodes = [0];
		for (const L of s.spans) nodes.push(nodes[nodes.length - 1] + L);
		const total = nodes[n];
		const loads: Load[] = [];
		if (s.g) loads.push({ kind: 'uniform', from: 0, to: total, value: s.g, action: 'permanent' });
		for (const [i, q] of s.imposed) {
			const k = i % n;
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
		if (s.linear) {
			const [a, b] = s.linear;
			loads.push({ kind: 'linear', from: 0, to: total / 2, start: a, end: b, action: 'temporary' });
		}
		return {
			beam,
			nodes,
			loads,
			EI: s.spans.map((_, i) => s.EI[i] * 1e12),
			limit: s.spans.map((_, i) => s.limit[i] * 1e6),
			set: s.set
		};
	})
	.filter((c) => findMechanismIssues(c.beam).length === 0);

function makeContext(c: {
	beam: BeamLine;
	nodes: number[];
	loads: Load[];
	EI: number[];
	set: string;
}): CheckContext {
	const hasImposed = c.loads.some((l) => l.action === 'imposed');
	const factors = en1993.resolveFactors({ set: c.set as 'en1990-6.10' }, { hasImposed });
	const imposedSpans = c.beam.spans.flatMap((_, i) =>
		c.loads.some((l) => l.action === 'imposed' && l.kind !== 'point' && l.from === c.nodes[i])
			? [i]
			: []
	);
	const arrangements = listLoadArrangements({
		combinations: factors.combinations,
		spanCount: c.beam.spans.length,
		imposedSpans
	});
	const effects = analyseLoadGroups({ beam: c.beam, EI: c.EI, loads: c.loads });
	// Only what the elastic bending row reads.
	return {
		beam: c.beam,
		nodes: c.nodes,
		loads: c.loads,
		arrangements,
		effects,
		basis: en1993
	} as CheckContext;
}

describe('elastic bending by superposed pieces', () => {
	it('matches the exhaustive re-analysis of every arrangement on 200 random beams', () => {
		fc.assert(
			fc.property(arbitraryCase, (c) => {
				const ctx = makeContext(c);
				for (const elastic of [true, false]) {
					const o = { EI: c.EI, resistance: c.limit, elastic };
					const fast = checkElasticBending(ctx, o);
					const slow = checkElasticBendingByReanalysis(ctx, o);
					if (slow.multiplierAtCapacity === null) expect(fast.multiplierAtCapacity).toBeNull();
					else
						expectRel(fast.multiplierAtCapacity, slow.multiplierAtCapacity, 1e-9, {
							absolute: 1e-12
						});
					expectRel(fast.utilisation, slow.utilisation, 1e-9, { absolute: 1e-12 });
					expectRel(fast.utilisationExisting ?? 0, slow.utilisationExisting ?? 0, 1e-9, {
						absolute: 1e-12
					});
					expect(fast.pass).toBe(slow.pass);
				}
			}),
			{ numRuns: 200 }
		);
		// The exhaustive side analyses every arrangement afresh: slow by design.
	}, 300_000);
});
