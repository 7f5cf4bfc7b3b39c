/**
 * momentAt / shearAt read the collapse diagram exactly between its points (M is a cubic at most
 * between them). Checked against statics of a simple span at collapse (case A24 of the
 * engineering notes: g = 20 kN/m fixed, Q at 1 m, Mp = 100 kN·m, L = 6 m; collapse
 * Q = 120√10 − 360 kN by virtual work, Neal/Horne method, derived in the plastic-theory tests):
 * R_A = gL/2 + Q(L − 1)/L, M(x) = R_A·x − g·x²/2 − Q·⟨x − 1⟩.
 */
import { describe, expect, it } from 'vitest';
import { momentAt, shearAt, solveCollapse } from '../../../src/lib/engine/collapse';
import { makeProblem } from './builders';

describe('momentAt / shearAt', () => {
	it('match the statics of a collapsed simple span anywhere, including inside loaded intervals', () => {
		const r = solveCollapse(
			makeProblem({
				spans: [6],
				supports: ['pin', 'pin'],
				Mp: 100,
				fixed: [{ w: 20, from: 0, to: 6 }],
				variable: [{ P: 1, at: 1 }]
			})
		);
		expect(r.status).toBe('mechanism');
		if (r.status !== 'mechanism') return;
		const Q = (120 * Math.sqrt(10) - 360) * 1000; // N
		const g = 20; // N/mm
		const RA = (g * 6000) / 2 + (Q * 5) / 6;
		expect(Math.abs(r.reactions[0] - RA) / RA).toBeLessThan(1e-9);
		for (const x of [0, 437.5, 1000, 1999.3, 2837.7, 4123.4, 6000]) {
			const M = RA * x - (g * x * x) / 2 - (x > 1000 ? Q * (x - 1000) : 0);
			expect(Math.abs(momentAt(r, x) - M) / 100e6).toBeLessThan(1e-9); // result or diagram
			const V = RA - g * x - (x >= 1000 ? Q : 0); // right-hand value at the load
			expect(Math.abs(shearAt(r.diagram, x, 'right') - V) / RA).toBeLessThan(1e-9);
		}
		// A position that misses the end by rounding (units converted elsewhere) reads the end value.
		expect(shearAt(r, 6000 * (1 + 1e-12))).toBe(shearAt(r, 6000));
		expect(() => momentAt(r, 6001)).toThrow(RangeError);
		// Shear jumps by Q at the point load.
		expect(shearAt(r.diagram, 1000, 'left') - shearAt(r.diagram, 1000, 'right')).toBeCloseTo(Q, 3);
	});
});
