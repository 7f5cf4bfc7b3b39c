// Unit conversions for the UI, checked against the exact definitions in NIST SP 811 (2008),
// Appendix B: inch = 0.0254 m exactly, foot = 0.3048 m exactly, pound (avoirdupois) =
// 0.453 592 37 kg exactly, standard gravity g_n = 9.806 65 m/s² exactly, so
// pound-force = 0.453 592 37 × 9.806 65 N and kip = 1000 lbf.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { formatQuantity, fromDisplay, toDisplay } from '../../../src/lib/ui/format';
import type { Quantity } from '../../../src/lib/ui/format';
import { US } from '../../../src/lib/engine/units';
import { expectRel } from '../../support/expect-rel';

const IN_M = 0.0254; // NIST SP 811 B.8, exact
const FT_M = 12 * IN_M; // NIST SP 811 B.8, exact (= 0.3048)
const LBF_N = 0.45359237 * 9.80665; // NIST SP 811 B.8 (pound-force), exact by definition
const KIP_KN = (1000 * LBF_N) / 1000;
const KSI_MPA = (1000 * LBF_N) / (IN_M * 1000) ** 2; // kip per square inch, in N/mm²
const REL = 1e-12;

describe('toDisplay and fromDisplay in US units', () => {
	it('converts one display unit of each quantity to its SI value (NIST SP 811 App. B)', () => {
		const cases: [Quantity, number][] = [
			['length', FT_M],
			['dimension', IN_M * 1000],
			['force', KIP_KN],
			['lineLoad', KIP_KN / FT_M],
			['moment', KIP_KN * FT_M],
			['stress', KSI_MPA]
		];
		for (const [quantity, si] of cases) {
			expectRel(toDisplay(si, quantity, 'US'), 1, REL);
			const back = fromDisplay('1', quantity, 'US');
			expect(back.ok).toBe(true);
			if (back.ok) expectRel(back.value, si, REL);
		}
	});

	it('matches the rounded factors printed in NIST SP 811 B.9', () => {
		// kip → 4.448 222 kN, ksi → 6.894 757 MPa
		expectRel(toDisplay(4.448222, 'force', 'US'), 1, 1e-6);
		expectRel(toDisplay(6.894757, 'stress', 'US'), 1, 1e-6);
	});

	it('leaves SI values unchanged in SI', () => {
		fc.assert(
			fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (v) => {
				expect(toDisplay(v, 'moment', 'SI')).toBe(v);
			})
		);
	});

	it('round-trips any value through display text in every quantity and system', () => {
		const quantity = fc.constantFrom<Quantity>(
			'length',
			'force',
			'lineLoad',
			'moment',
			'dimension',
			'stress'
		);
		fc.assert(
			fc.property(
				fc.double({ min: -1e7, max: 1e7, noNaN: true }),
				quantity,
				fc.constantFrom('SI' as const, 'US' as const),
				(v, q, units) => {
					// String(x) prints the shortest text that reads back to the same double.
					const back = fromDisplay(String(toDisplay(v, q, units)), q, units);
					expect(back.ok).toBe(true);
					const tolerance = 1e-12 * Math.abs(v) + 1e-300;
					if (back.ok) expect(Math.abs(back.value - v)).toBeLessThanOrEqual(tolerance);
				}
			)
		);
	});
});

describe('formatQuantity', () => {
	it('shows the symbol of the chosen system', () => {
		expect(formatQuantity(KIP_KN * FT_M * 10, 'moment', 'US')).toBe('10.0\u00a0kip-ft');
		expect(formatQuantity(12.345, 'moment', 'SI')).toBe('12.3\u00a0kNm');
		expect(formatQuantity(25.4, 'dimension', 'US', 2)).toBe('1.00\u00a0in');
		expect(formatQuantity(355, 'stress', 'SI')).toBe('355\u00a0MPa');
	});

	it('never prints NaN, Infinity or a negative zero', () => {
		expect(formatQuantity(Number.NaN, 'force', 'SI')).toBe('—\u00a0kN');
		expect(formatQuantity(Infinity, 'force', 'SI')).toBe('—\u00a0kN');
		expect(formatQuantity(-0.0001, 'force', 'SI')).toBe('0.0\u00a0kN');
	});
});

describe('the engine’s US factors (src/lib/engine/units.ts)', () => {
	it('equal the exact definitions of NIST SP 811 Appendix B', () => {
		expectRel(US.inToMm, IN_M * 1000, 1e-15);
		expectRel(US.ftToM, FT_M, 1e-15);
		expectRel(US.kipToKN, KIP_KN, 1e-14);
		expectRel(US.ksiToMPa, KSI_MPA, 1e-14);
		// lb/ft → kg/m: 0.453 592 37 kg per 0.3048 m.
		expectRel(US.lbPerFtToKgPerM, 0.45359237 / FT_M, 1e-14);
	});
});
