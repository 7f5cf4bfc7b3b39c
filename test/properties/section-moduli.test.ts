/**
 * Plastic modulus never below the elastic one (lower-bound theorem applied to one cross-section:
 * Wpl ≥ Wel for any section; textbook, e.g. Neal, The Plastic Methods of Structural Analysis,
 * from memory), positive finite properties, and Wpl,y equal to the sum of first moments of the two
 * halves, checked by numerical strip integration of the rolled I outline.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { computeSectionProperties, listSections } from '../../src/lib/engine/section/index';

describe('Wpl ≥ Wel', () => {
	it('for every library section about both axes, all properties finite and positive', () => {
		for (const s of listSections()) {
			const p = s.props;
			expect(p.Wply).toBeGreaterThanOrEqual(p.Wely);
			expect(p.Wplz).toBeGreaterThanOrEqual(p.Welz);
			for (const [key, v] of Object.entries(p)) {
				if (s.shape !== 'I' && (key === 'Iw' || key === 'd')) continue; // closed: Iw = 0; CHS: no flat d
				expect(Number.isFinite(v) && v > 0, `${s.designation} ${key} = ${v}`).toBe(true);
			}
		}
	});

	it('for random rolled I, RHS and CHS shapes', () => {
		fc.assert(
			fc.property(
				fc.double({ min: 80, max: 900, noNaN: true }),
				fc.double({ min: 0.3, max: 1.1, noNaN: true }),
				fc.double({ min: 2, max: 20, noNaN: true }),
				(h, ratio, t) => {
					const b = Math.max(h * ratio, 6 * t + 20);
					const i = computeSectionProperties('I', {
						h,
						b,
						tw: t,
						tf: Math.min(1.5 * t, h / 5),
						r: t
					});
					const rhs = computeSectionProperties('RHS', {
						h,
						b: Math.max(h * ratio, 4 * t),
						t,
						ro: 1.5 * t,
						ri: t
					});
					const chs = computeSectionProperties('CHS', { d: h, t: Math.min(t, h / 4) });
					for (const p of [i, rhs, chs]) {
						expect(p.Wply).toBeGreaterThanOrEqual(p.Wely * (1 - 1e-12));
						expect(p.Wplz).toBeGreaterThanOrEqual(p.Welz * (1 - 1e-12));
					}
				}
			)
		);
	});
});

describe('closed-form I-section properties against strip integration', () => {
	it('A, Iy and Wpl,y of 305x165x40 UB agree with 20 000 strips to 1e-5', () => {
		const [h, b, tw, tf, r] = [303.4, 165, 6, 10.2, 8.9];
		const hw = h - 2 * tf;
		// Width of steel at height y above the centroid (fillets as quarter-circle spandrels).
		const width = (y: number): number => {
			const a = Math.abs(y);
			if (a >= hw / 2) return b;
			const fromFlange = hw / 2 - a;
			if (fromFlange >= r) return tw;
			const dx = r - Math.sqrt(r * r - (r - fromFlange) ** 2);
			return tw + 2 * dx;
		};
		// Flanges exactly; the web and fillets (continuous width) by 20 000 midpoint strips per half.
		let A = 2 * b * tf;
		let I = 2 * ((b * tf ** 3) / 12 + b * tf * ((h - tf) / 2) ** 2);
		let S = b * tf * (h - tf);
		const n = 20_000;
		for (let k = 0; k < n; k++) {
			const y = ((k + 0.5) * hw) / 2 / n;
			const dA = (width(y) * hw) / 2 / n;
			A += 2 * dA;
			I += 2 * dA * y * y;
			S += 2 * dA * y;
		}
		const p = computeSectionProperties('I', { h, b, tw, tf, r });
		expect(Math.abs(p.A / A - 1)).toBeLessThan(1e-5);
		expect(Math.abs(p.Iy / I - 1)).toBeLessThan(1e-5);
		expect(Math.abs(p.Wply / S - 1)).toBeLessThan(1e-5);
	});
});
