/**
 * fast-check generators of stable beam lines and loads (internal units), shared by the elastic
 * property tests.
 */
import fc from 'fast-check';
import { findMechanismIssues } from '../../../src/lib/engine/elastic/index';
import type { BeamLine, Load, SupportKind } from '../../../src/lib/engine/model/types';

/** A stable beam line of 1–3 spans (1–10 m) with EI per span. */
export const stableBeam = fc
	.integer({ min: 1, max: 3 })
	.chain((n) =>
		fc.record({
			spans: fc.array(fc.integer({ min: 1000, max: 10000 }), { minLength: n, maxLength: n }),
			ends: fc.tuple(
				fc.constantFrom<SupportKind>('pin', 'fixed', 'free'),
				fc.constantFrom<SupportKind>('pin', 'fixed', 'free')
			),
			inner: fc.array(fc.constantFrom<SupportKind>('pin', 'fixed', 'free'), {
				minLength: n - 1,
				maxLength: n - 1
			}),
			joints: fc.array(fc.constantFrom('continuous' as const, 'simple' as const), {
				minLength: n - 1,
				maxLength: n - 1
			}),
			EI: fc.array(fc.double({ min: 1e12, max: 1e14, noNaN: true }), { minLength: n, maxLength: n })
		})
	)
	.map(({ spans, ends, inner, joints, EI }) => ({
		beam: { spans, supports: [ends[0], ...inner, ends[1]], joints } as BeamLine,
		EI
	}))
	.filter(({ beam }) => findMechanismIssues(beam).length === 0);

/** Loads on a beam of total length `total` (mm): points, uniform and linear, either sign. */
export const loadsOn = (total: number): fc.Arbitrary<Load[]> => {
	const pos = fc.double({ min: 0, max: 1, noNaN: true }).map((t) => Math.round(t * total));
	const value = fc.double({ min: -30, max: 30, noNaN: true });
	const pointLoad = fc
		.record({ x: pos, v: value })
		.map(({ x, v }): Load => ({ kind: 'point', x, value: v * 1000, action: 'temporary' }));
	const range = fc
		.tuple(pos, pos)
		.filter(([a, b]) => a !== b)
		.map(([a, b]) => [Math.min(a, b), Math.max(a, b)]);
	const uniform = fc.record({ r: range, v: value }).map(({ r, v }): Load => ({
		kind: 'uniform',
		from: r[0],
		to: r[1],
		value: v,
		action: 'imposed'
	}));
	const linear = fc.record({ r: range, s: value, e: value }).map(({ r, s, e }): Load => ({
		kind: 'linear',
		from: r[0],
		to: r[1],
		start: s,
		end: e,
		action: 'permanent'
	}));
	return fc.array(fc.oneof(pointLoad, uniform, linear), { minLength: 1, maxLength: 4 });
};

/** Total downward force (N) and its moment about x = 0 (N·mm) of a load list. */
export function sumLoads(loads: Load[]): { force: number; moment: number } {
	let force = 0;
	let moment = 0;
	for (const l of loads) {
		if (l.kind === 'point') {
			force += l.value;
			moment += l.value * l.x;
			continue;
		}
		const [a, b] = l.kind === 'uniform' ? [l.value, l.value] : [l.start, l.end];
		const len = l.to - l.from;
		// Trapezoid: resultant (a + b)/2·len at from + len(a + 2b)/(3(a + b)), here without division.
		force += ((a + b) / 2) * len;
		moment += ((a + b) / 2) * len * l.from + (len * len * (a + 2 * b)) / 6;
	}
	return { force, moment };
}
