/**
 * Robustness of the design checks on random valid beams (invented): one to three spans, any end
 * supports (pinned, built-in, free overhang), point, uniform and linear loads of every action,
 * every restraint and load height, every factor set. The report is always produced, every
 * number in it is finite (the report asserts that), utilisations are not negative, and the
 * verdict is one of the three words.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkCase } from '../../src/lib/engine/index';

const action = fc.constantFrom('permanent', 'imposed', 'temporary');
const beamArb = fc
	.record({
		spans: fc.array(fc.double({ min: 1, max: 8, noNaN: true }), { minLength: 1, maxLength: 3 }),
		left: fc.constantFrom('pin', 'fixed', 'free'),
		right: fc.constantFrom('pin', 'fixed', 'free'),
		designation: fc.constantFrom(
			'UB 305x165x40',
			'UC 203x203x46',
			'UC 152x152x23',
			'IPE 300',
			'SHS 100x100x5.0'
		),
		grade: fc.constantFrom('S275', 'S355'),
		set: fc.constantFrom('en1990-6.10', 'en1990-6.10ab', 'custom'),
		restraint: fc.constantFrom(undefined, 'continuous', 'ends-only', 'points'),
		height: fc.constantFrom('top-flange', 'shear-centre', 'bottom-flange'),
		loads: fc.array(
			fc.record({
				kind: fc.constantFrom('point', 'uniform', 'linear'),
				a: fc.double({ min: 0, max: 1, noNaN: true }),
				b: fc.double({ min: 0, max: 1, noNaN: true }),
				v: fc.double({ min: 0.5, max: 40, noNaN: true }),
				action
			}),
			{ minLength: 1, maxLength: 4 }
		)
	})
	.filter((o) => !(o.left === 'free' && o.right === 'free'))
	.filter(
		(o) =>
			!(
				o.spans.length === 1 &&
				(o.left === 'free' || o.right === 'free') &&
				o.left !== 'fixed' &&
				o.right !== 'fixed'
			)
	);

// `any`: test data assembled from the arbitrary above.
function build(o: any) {
	const total = o.spans.reduce((s: number, L: number) => s + L, 0);
	const supports = [o.left, ...o.spans.slice(1).map(() => 'pin'), o.right];
	const loads = o.loads.map((l: any) => {
		const [p, q] = [Math.min(l.a, l.b) * total, Math.max(l.a, l.b) * total];
		if (l.kind === 'point') return { kind: 'point', x: p, value: l.v, action: l.action };
		const to = q - p < 0.1 ? Math.min(total, p + 0.1) : q;
		const from = Math.min(p, to - 0.05);
		if (l.kind === 'uniform')
			return { kind: 'uniform', from, to, value: l.v / 4, action: l.action };
		return { kind: 'linear', from, to, start: 0, end: l.v / 4, action: l.action };
	});
	const restraint =
		o.restraint === undefined
			? undefined
			: {
					lateral: o.restraint === 'points' ? [total / 3, (2 * total) / 3] : o.restraint,
					loadHeight: o.height
				};
	return {
		format: 'hingepoint.case',
		version: 1,
		beam: {
			spans: o.spans,
			supports,
			section: { designation: o.designation },
			grade: o.grade,
			...(restraint ? { restraint } : {})
		},
		loads,
		factors: { set: o.set }
	};
}

describe('design checks on random valid beams', () => {
	it('always report, with finite numbers and a verdict (or, with no proposed load, a plain message)', () => {
		let reported = 0;
		fc.assert(
			fc.property(beamArb, (o) => {
				const out = checkCase(build(o));
				if (!out.ok) return; // the random beam was invalid input: issues, not a verdict
				reported++;
				const r = out.report;
				expect(['pass', 'fail', 'outside-scope', null]).toContain(r.answer.verdict);
				for (const c of r.checks) expect(c.utilisation).toBeGreaterThanOrEqual(0);
				expect(r.notices[0]).toMatch(/engineer of record/);
				expect(r.summary.short.length).toBeLessThan(600);
			}),
			{ numRuns: 25 }
		);
		// Most generated beams are valid, so the property is not vacuous.
		expect(reported).toBeGreaterThan(12);
	});
});
