/**
 * Properties of checkCase on random valid cases: no NaN or Infinity anywhere in a report, and the
 * collapse factor scales inversely with the temporary loads (the static and kinematic theorems
 * are homogeneous in the loads — simple plastic theory, Neal 1977, from memory).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { findMechanismIssues } from '../../../src/lib/engine/elastic/index';
import { checkCase } from '../../../src/lib/engine/index';
import type { SupportKind } from '../../../src/lib/engine/model/types';

const SECTIONS = [
	{ mp: 120 },
	{ mp: 80, mass: 30 },
	{ designation: 'UB 305x165x40' },
	{ designation: 'IPE 240' },
	{ designation: 'SHS 100x100x8.0' }
];
const SUPPORT = fc.constantFrom<SupportKind>('pin', 'fixed', 'free');
const ACTIONS = ['permanent', 'imposed', 'temporary'] as const;

/** A random valid case file (file units, invented numbers). */
const caseFile = fc
	.record({
		spans: fc.array(
			fc.integer({ min: 10, max: 100 }).map((d) => d / 10),
			{ minLength: 1, maxLength: 3 }
		),
		ends: fc.tuple(SUPPORT, SUPPORT),
		section: fc.constantFrom(...SECTIONS),
		grade: fc.constantFrom('S275', 'S355'),
		selfWeight: fc.boolean(),
		loads: fc.array(
			fc.record({
				kind: fc.constantFrom('point', 'uniform', 'linear'),
				a: fc.double({ min: 0, max: 1, noNaN: true }),
				b: fc.double({ min: 0, max: 1, noNaN: true }),
				v: fc.double({ min: 0.1, max: 40, noNaN: true }),
				// Zero or a meaningful size: the case file refuses non-zero loads below 1 N.
				w: fc.oneof(fc.constant(0), fc.double({ min: 1e-3, max: 40, noNaN: true })),
				action: fc.constantFrom(...ACTIONS)
			}),
			{ minLength: 1, maxLength: 4 }
		)
	})
	.map((r) => {
		const n = r.spans.length;
		const supports = [r.ends[0], ...new Array<SupportKind>(n - 1).fill('pin'), r.ends[1]];
		const total = r.spans.reduce((s, L) => s + L, 0);
		const round = (t: number) => Math.round(t * total * 100) / 100;
		const loads = r.loads.map((l) => {
			const [p, q] = [round(Math.min(l.a, l.b)), round(Math.max(l.a, l.b))];
			const action = l.action;
			if (l.kind === 'point' || q <= p) return { kind: 'point', x: p, value: l.v, action };
			if (l.kind === 'uniform') return { kind: 'uniform', from: p, to: q, value: l.v, action };
			return { kind: 'linear', from: p, to: q, start: l.v, end: l.w, action: l.action };
		});
		return {
			format: 'hingepoint.case',
			version: 1,
			title: 'DEMO — random',
			beam: {
				spans: r.spans,
				supports,
				section: r.section,
				grade: r.grade,
				selfWeight: r.selfWeight,
				// Held throughout: these properties are about the collapse solve and finiteness; the
				// slower buckling route of the default restraint is fuzzed in test/properties.
				restraint: { lateral: 'continuous' }
			},
			loads
		};
	})
	.filter((c) => {
		const beam = { spans: c.beam.spans, supports: c.beam.supports, joints: [] };
		return findMechanismIssues(beam).length === 0;
	});

/** A file load with its temporary value doubled; other loads unchanged. */
function doubleTemporary(l: any): any {
	if (l.action !== 'temporary') return l;
	if (l.kind === 'linear') return { ...l, start: 2 * l.start, end: 2 * l.end };
	return { ...l, value: 2 * l.value };
}

function collectNumbers(value: unknown, out: number[] = []): number[] {
	if (typeof value === 'number') out.push(value);
	else if (Array.isArray(value)) value.forEach((v) => collectNumbers(v, out));
	else if (value && typeof value === 'object') {
		Object.values(value).forEach((v) => collectNumbers(v, out));
	}
	return out;
}

describe('checkCase on random valid cases', () => {
	it('gives a report in which every number is finite', () => {
		fc.assert(
			fc.property(caseFile, (c) => {
				const out = checkCase(c, { curve: true });
				expect(out.ok).toBe(true);
				if (out.ok) expect(collectNumbers(out.report).every(Number.isFinite)).toBe(true);
			}),
			{ numRuns: 40 }
		);
	});

	it('doubling the temporary loads halves the collapse factor', () => {
		fc.assert(
			fc.property(caseFile, (c) => {
				const doubled = { ...c, loads: c.loads.map(doubleTemporary) };
				const a = checkCase(c);
				const b = checkCase(doubled);
				if (!a.ok || !b.ok || !a.report.collapse || !b.report.collapse) return;
				if (a.report.collapse.appliesTo !== 'temporary') return;
				const [la, lb] = [a.report.collapse.loadFactor, b.report.collapse.loadFactor];
				if (la === null || lb === null) {
					expect(la).toBe(lb);
					return;
				}
				expect(Math.abs(lb - la / 2)).toBeLessThanOrEqual(1e-6 * la);
			}),
			{ numRuns: 25 }
		);
	});
});
