/**
 * Invariants of the verdict on invented simply supported and two-span beams:
 * - the largest temporary load (multiplier × entered value) does not depend on the size entered,
 *   because every check is solved for the multiplier (proportional loading);
 * - pass exactly when the allowable multiplier is at least 1 (the definition of the verdict);
 * - mirroring the beam end for end changes nothing (statics is symmetric).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkCase } from '../../src/lib/engine/index';

const build = (o: {
	spans: readonly number[];
	g: number;
	q: number;
	at: number;
	restraint: boolean;
}) => ({
	format: 'hingepoint.case',
	version: 1,
	beam: {
		spans: o.spans,
		supports: o.spans.map(() => 'pin').concat('pin'),
		section: { designation: 'UB 305x165x40' },
		grade: 'S275',
		...(o.restraint ? { restraint: { lateral: 'ends-only', loadHeight: 'top-flange' } } : {})
	},
	loads: [
		{
			kind: 'uniform',
			from: 0,
			to: o.spans.reduce((a, b) => a + b, 0),
			value: o.g,
			action: 'permanent'
		},
		{ kind: 'point', x: o.at, value: o.q, action: 'temporary' }
	]
});

const arb = fc
	.record({
		spans: fc.constantFrom([6], [4.5], [5, 5], [4, 6]),
		g: fc.double({ min: 0.5, max: 8, noNaN: true }),
		q: fc.double({ min: 5, max: 80, noNaN: true }),
		f: fc.double({ min: 0.1, max: 0.9, noNaN: true }),
		restraint: fc.boolean()
	})
	.map((o) => ({ ...o, at: o.f * o.spans.reduce((a, b) => a + b, 0) }));

function report(json: unknown) {
	const out = checkCase(json);
	if (!out.ok) throw new Error(out.issues[0].message);
	return out.report;
}

describe('verdict invariants', () => {
	it('the largest temporary load does not depend on the load entered; pass ⟺ multiplier ≥ 1', () => {
		fc.assert(
			fc.property(arb, fc.double({ min: 0.3, max: 3, noNaN: true }), (o, k) => {
				const a = report(build(o));
				const b = report(build({ ...o, q: o.q * k }));
				const capA = a.answer.allowable[0].value!;
				const capB = b.answer.allowable[0].value!;
				expect(Math.abs(capA / capB - 1)).toBeLessThan(1e-5);
				for (const r of [a, b]) {
					expect(r.answer.verdict === 'pass').toBe(r.answer.multiplier! >= 1);
				}
			}),
			{ numRuns: 12 }
		);
	});

	it('mirroring the beam end for end gives the same allowable load and governing check', () => {
		fc.assert(
			fc.property(arb, (o) => {
				const total = o.spans.reduce((x, y) => x + y, 0);
				const a = report(build(o));
				const b = report(build({ ...o, spans: [...o.spans].reverse(), at: total - o.at }));
				const capA = a.answer.allowable[0].value!;
				expect(Math.abs(capA / b.answer.allowable[0].value! - 1)).toBeLessThan(1e-5);
				expect(b.answer.governing?.id).toBe(a.answer.governing?.id);
			}),
			{ numRuns: 12 }
		);
	});
});
