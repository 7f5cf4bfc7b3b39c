/**
 * An element with many loads is read from a table of states at its load positions
 * (`field-table.ts`) instead of summing every load at each reading (`readBySums`). Both are the
 * same statics and double integration of M/EI (any structural analysis text, e.g. Megson,
 * Structural and Stress Analysis, ch. 13, from memory), so on random elements (point loads,
 * also at the ends, and linear line loads) the shear, moment, slope and deflection must agree
 * to round-off of their own scale, on both sides of every load.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readBySums, type ElementData } from '../../src/lib/engine/elastic/element-field';
import type { ElementLoad } from '../../src/lib/engine/elastic/element-loads';
import { readByTable } from '../../src/lib/engine/elastic/field-table';

const elementArb = fc.integer({ min: 1000, max: 12000 }).chain((L) =>
	fc.record({
		L: fc.constant(L),
		loads: fc.array(
			fc.oneof(
				fc
					.tuple(
						fc.oneof(fc.constantFrom(0, 1), fc.double({ min: 0, max: 1, noNaN: true })),
						fc.integer({ min: -40, max: 80 })
					)
					.map(([t, kN]): ElementLoad => ({ kind: 'point', a: t * L, P: kN * 1e3 })),
				fc
					.tuple(
						fc.double({ min: 0, max: 1, noNaN: true }),
						fc.double({ min: 0, max: 1, noNaN: true }),
						fc.integer({ min: -5, max: 20 }),
						fc.integer({ min: -5, max: 20 })
					)
					.map(([p, q, wa, wb]): ElementLoad => {
						const [a, b] = [Math.min(p, q) * L, Math.max(p, q) * L];
						return { kind: 'line', a, b, wa, wb };
					})
			),
			{ minLength: 1, maxLength: 40 }
		),
		forces: fc.tuple(fc.integer({ min: -1e5, max: 1e5 }), fc.integer({ min: -1e8, max: 1e8 })),
		ends: fc.tuple(
			fc.double({ min: -5, max: 5, noNaN: true }),
			fc.double({ min: -0.01, max: 0.01, noNaN: true })
		),
		reads: fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { maxLength: 10 })
	})
);

describe('element readings from a table of states', () => {
	it('match summing every load on random elements', () => {
		fc.assert(
			fc.property(elementArb, (c) => {
				const el: ElementData = {
					L: c.L,
					EI: 2.1e5 * 8.5e7,
					loads: c.loads,
					displacements: [c.ends[0], c.ends[1], 0, 0],
					forces: [c.forces[0], c.forces[1], 0, 0]
				};
				// Scales of each quantity: what the largest terms of the sums can reach.
				const P =
					Math.abs(c.forces[0]) +
					c.loads.reduce(
						(s, l) =>
							s + (l.kind === 'point' ? Math.abs(l.P) : (Math.abs(l.wa) + Math.abs(l.wb)) * c.L),
						0
					);
				const M = Math.abs(c.forces[1]) + P * c.L;
				const scale = {
					V: P,
					M,
					slope: Math.abs(c.ends[1]) + (M * c.L) / el.EI,
					w: Math.abs(c.ends[0]) + c.L * (Math.abs(c.ends[1]) + (M * c.L) / el.EI)
				};
				const xs = [
					0,
					c.L,
					...c.loads.flatMap((l) => (l.kind === 'point' ? [l.a] : [l.a, l.b])),
					...c.reads.map((t) => t * c.L)
				];
				for (const x of xs) {
					for (const side of ['left', 'right'] as const) {
						const a = readBySums(el, x, side);
						const b = readByTable(el, x, side);
						for (const k of ['V', 'M', 'slope', 'w'] as const) {
							expect(Math.abs(a[k] - b[k]), `${k} at ${x} ${side}`).toBeLessThanOrEqual(
								1e-12 * scale[k] + 1e-300
							);
						}
					}
				}
			}),
			{ numRuns: 300 }
		);
	});
});
