/**
 * Elastic limit factors with fixed loads held, against statics of a simply supported span
 * (midspan moments wL²/8 and QL/4, any structural analysis textbook) and EN 1993-1-1 6.2.5
 * (Mel,Rd = Wel·fy/γM0). Numbers are invented.
 */
import { describe, expect, it } from 'vitest';
import { firstHingeFactor, firstYieldFactor } from '../../../src/lib/engine/elastic/index';
import type { BeamLine, Load } from '../../../src/lib/engine/model/types';

const L = 6000;
const beam: BeamLine = { spans: [L], supports: ['pin', 'pin'], joints: [] };
const EI = [1.785e13];
const g = 5; // N/mm, held
const Q = 10_000; // N, scaled
const fixedLoads: Load[] = [{ kind: 'uniform', from: 0, to: L, value: g, action: 'permanent' }];
const variableLoads: Load[] = [{ kind: 'point', x: L / 2, value: Q, action: 'temporary' }];

describe('elastic limit factors', () => {
	it('first yield: gL²/8 + λ·QL/4 = Wel·fy/γM0 at midspan', () => {
		const Mel = 560e3 * 275; // Wel 560 cm³ × fy 275 MPa, γM0 = 1
		const r = firstYieldFactor({ beam, EI, fixedLoads, variableLoads, elasticResistance: [Mel] });
		expect(r.status).toBe('reached');
		if (r.status !== 'reached') return;
		const expected = (Mel - (g * L * L) / 8) / ((Q * L) / 4);
		expect(Math.abs(r.factor - expected)).toBeLessThanOrEqual(1e-9 * expected);
		expect(r.x).toBeCloseTo(L / 2, 6);
	});

	it('reports failure under the fixed loads alone instead of a negative factor', () => {
		const Mp = ((g * L * L) / 8) * 0.9;
		const r = firstHingeFactor({ beam, EI, fixedLoads, variableLoads, plasticResistance: [Mp] });
		expect(r.status).toBe('fails-under-fixed');
	});

	it('says "never" when the variable loads cause no moment (load on a support)', () => {
		const onSupport: Load[] = [{ kind: 'point', x: 0, value: Q, action: 'temporary' }];
		const r = firstHingeFactor({
			beam,
			EI,
			fixedLoads,
			variableLoads: onSupport,
			plasticResistance: [1e9]
		});
		expect(r.status).toBe('never');
	});
});
