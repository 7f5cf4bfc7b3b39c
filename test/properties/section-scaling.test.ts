/**
 * Scaling laws of cross-section properties (dimensional analysis, any mechanics textbook):
 * multiplying every dimension by k multiplies A by k², I and It by k⁴, W by k³, Iw by k⁶ and
 * radii of gyration by k. Relative tolerance 1e-9 (floating point only).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { computeSectionProperties } from '../../src/lib/engine/section/index';
import type { SectionProps } from '../../src/lib/engine/section/index';

const POWERS: Record<keyof SectionProps, number> = {
	A: 2,
	mass: 2,
	Iy: 4,
	Iz: 4,
	Wely: 3,
	Wply: 3,
	Welz: 3,
	Wplz: 3,
	It: 4,
	Iw: 6,
	iy: 1,
	iz: 1,
	Avz: 2,
	d: 1
};
const expectScaled = (scaled: SectionProps, base: SectionProps, k: number): void => {
	for (const key of Object.keys(POWERS) as (keyof SectionProps)[]) {
		const expected = base[key] * k ** POWERS[key];
		expect(Math.abs(scaled[key] - expected)).toBeLessThanOrEqual(1e-9 * Math.abs(expected) + 1e-12);
	}
};
const scale = <T extends object>(dims: T, k: number): T =>
	Object.fromEntries(Object.entries(dims).map(([key, v]) => [key, (v as number) * k])) as T;

const iDims = fc
	.record({
		h: fc.double({ min: 100, max: 1000, noNaN: true }),
		bRatio: fc.double({ min: 0.3, max: 1.1, noNaN: true }),
		tw: fc.double({ min: 3, max: 20, noNaN: true }),
		tf: fc.double({ min: 4, max: 30, noNaN: true }),
		r: fc.double({ min: 0, max: 20, noNaN: true })
	})
	.map(({ h, bRatio, tw, tf, r }) => ({
		h,
		b: Math.max(h * bRatio, tw + 2 * r + 10),
		tw,
		tf: Math.min(tf, h / 4),
		r
	}));

describe('scaling every dimension by k', () => {
	it('rolled I: doubling multiplies A by 4 and Iy by 16 (and so on for every property)', () => {
		fc.assert(
			fc.property(iDims, fc.double({ min: 0.25, max: 4, noNaN: true }), (dims, k) => {
				expectScaled(
					computeSectionProperties('I', scale(dims, k)),
					computeSectionProperties('I', dims),
					k
				);
			})
		);
		const base = computeSectionProperties('I', { h: 303.4, b: 165, tw: 6, tf: 10.2, r: 8.9 });
		const doubled = computeSectionProperties('I', { h: 606.8, b: 330, tw: 12, tf: 20.4, r: 17.8 });
		expect(doubled.A / base.A).toBeCloseTo(4, 12);
		expect(doubled.Iy / base.Iy).toBeCloseTo(16, 12);
	});

	it('welded I obeys the same laws', () => {
		fc.assert(
			fc.property(iDims, fc.double({ min: 0.25, max: 4, noNaN: true }), (dims, k) => {
				const plate = { ...dims, r: 0 };
				const scaled = computeSectionProperties('welded-I', scale(plate, k));
				expectScaled(scaled, computeSectionProperties('welded-I', plate), k);
			})
		);
	});

	it('RHS, CHS and flat bar obey the same laws', () => {
		fc.assert(
			fc.property(
				fc.double({ min: 50, max: 400, noNaN: true }),
				fc.double({ min: 0.4, max: 1, noNaN: true }),
				fc.double({ min: 2, max: 12, noNaN: true }),
				fc.double({ min: 0.25, max: 4, noNaN: true }),
				(h, ratio, t, k) => {
					const rhs = { h, b: Math.max(h * ratio, 4 * t), t, ro: 1.5 * t, ri: t };
					expectScaled(
						computeSectionProperties('RHS', scale(rhs, k)),
						computeSectionProperties('RHS', rhs),
						k
					);
					const chs = { d: h, t };
					expectScaled(
						computeSectionProperties('CHS', scale(chs, k)),
						computeSectionProperties('CHS', chs),
						k
					);
					const flat = { h, b: t };
					expectScaled(
						computeSectionProperties('flat', scale(flat, k)),
						computeSectionProperties('flat', flat),
						k
					);
				}
			)
		);
	});
});
