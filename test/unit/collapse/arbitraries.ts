/**
 * Random beam lines for property tests and cross-checks (fast-check arbitraries). Invented
 * demo data in kN, m and kN·m: one to four spans, any ends, simple or continuous joints, unequal
 * sagging and hogging resistance, point, uniform and linear loads, some upward.
 */
import fc from 'fast-check';
import { validateBeamLine } from '../../../src/lib/engine/model/validate-beam';
import type { JointKind, SupportKind } from '../../../src/lib/engine/model/types';
import { makeProblem, type LoadSpec, type ProblemSpec } from './builders';

/** Options for `arbitraryBeamSpec`. */
export interface BeamArbitraryOptions {
	/** Allow `fixed` at interior nodes (moment jumps). */
	interiorFixed?: boolean;
	/** Allow upward loads. */
	upward?: boolean;
	/** Allow fixed (non-λ) loads. */
	fixedLoads?: boolean;
}

function arbitraryLoad(L: number, upward: boolean): fc.Arbitrary<LoadSpec> {
	const pos = fc.integer({ min: 0, max: 1000 }).map((k) => Math.round(L * k) / 1000);
	const sign = upward ? fc.constantFrom(1, 1, 1, -1) : fc.constant(1);
	const point = fc
		.record({ P: fc.integer({ min: 1, max: 60 }), s: sign, at: pos })
		.map(({ P, s, at }) => ({ P: P * s, at }));
	const range = fc
		.tuple(pos, pos)
		.filter(([a, b]) => Math.abs(a - b) > 0.05 * L)
		.map(([a, b]) => [Math.min(a, b), Math.max(a, b)]);
	const uniform = fc
		.record({ w: fc.integer({ min: 1, max: 30 }), s: sign, r: range })
		.map(({ w, s, r }) => ({ w: w * s, from: r[0], to: r[1] }));
	const linear = fc
		.record({
			w1: fc.integer({ min: 0, max: 30 }),
			w2: fc.integer({ min: 0, max: 30 }),
			s: sign,
			r: range
		})
		.filter(({ w1, w2 }) => w1 + w2 > 0)
		.map(({ w1, w2, s, r }) => ({ w1: w1 * s, w2: w2 * s, from: r[0], to: r[1] }));
	return fc.oneof(point, uniform, linear);
}

/** A random, structurally valid beam problem description. */
export function arbitraryBeamSpec(options: BeamArbitraryOptions = {}): fc.Arbitrary<ProblemSpec> {
	const { interiorFixed = false, upward = true, fixedLoads = true } = options;
	return fc
		.integer({ min: 1, max: 4 })
		.chain((n) =>
			fc.record({
				spans: fc.array(
					fc.integer({ min: 20, max: 90 }).map((k) => k / 10),
					{ minLength: n, maxLength: n }
				),
				ends: fc.tuple(
					fc.constantFrom<SupportKind>('pin', 'fixed', 'free'),
					fc.constantFrom<SupportKind>('pin', 'fixed', 'free')
				),
				inner: fc.array(
					fc.constantFrom<SupportKind>(
						...(interiorFixed ? (['pin', 'pin', 'fixed'] as const) : (['pin'] as const))
					),
					{ minLength: n - 1, maxLength: n - 1 }
				),
				joints: fc.array(
					fc.constantFrom<JointKind>('continuous', 'continuous', 'continuous', 'simple'),
					{ minLength: n - 1, maxLength: n - 1 }
				),
				Mp: fc.array(
					fc.tuple(fc.integer({ min: 50, max: 300 }), fc.integer({ min: 70, max: 130 })),
					{ minLength: n, maxLength: n }
				)
			})
		)
		.filter((b) =>
			validateBeamLine({
				spans: b.spans,
				supports: [b.ends[0], ...b.inner, b.ends[1]],
				joints: b.joints
			}).every((i) => i.severity !== 'error')
		)
		.chain((b) => {
			const L = b.spans.reduce((a, c) => a + c, 0);
			let x = 0;
			const Mp = b.spans.map((s, i) => {
				const seg = { from: x, to: x + s, sag: b.Mp[i][0], hog: (b.Mp[i][0] * b.Mp[i][1]) / 100 };
				x += s;
				return seg;
			});
			Mp[Mp.length - 1].to = L;
			return fc
				.record({
					fixed: fixedLoads
						? fc.array(arbitraryLoad(L, upward), { maxLength: 3 })
						: fc.constant<LoadSpec[]>([]),
					variable: fc.array(arbitraryLoad(L, upward), { minLength: 1, maxLength: 4 })
				})
				.map((loads): ProblemSpec => ({
					spans: b.spans,
					supports: [b.ends[0], ...b.inner, b.ends[1]],
					joints: b.joints,
					Mp,
					fixed: loads.fixed,
					variable: loads.variable
				}));
		});
}

export { makeProblem };
