/**
 * A six-span beam whose static program once lost its answer: a re-inverted, nearly singular
 * basis gave hinge rotations that no longer balanced (Gᵀw ≠ c), and the solver reported
 * λ = 0, not certified. The loads are those of a design arrangement (EN 1990 6.10a, imposed
 * on spans 2, 4 and 6) that showed it; the numbers are kept to every digit because the fault
 * depended on rounding. Expected values: the virtual work of the beam mechanism in span 1
 * (hinges under the 21 kN load and over support B), computed below by hand (Neal, "The Plastic
 * Methods of Structural Analysis", beam mechanism of a propped span), and the homogeneity of λ
 * in the variable loads (static theorem).
 */
import { describe, expect, it } from 'vitest';
import { solveCollapse } from '../../../src/lib/engine/collapse/index';
import type { CollapseProblem } from '../../../src/lib/engine/collapse/types';
import type { Load } from '../../../src/lib/engine/model/types';
import { expectRel } from '../../support/expect-rel';

const MP = 171345664.28674385;
const FIXED = [
	[0, 36000, 4.050000000000001],
	[6000, 12000, 4.199999999999999],
	[18000, 24000, 4.199999999999999],
	[30000, 36000, 4.199999999999999],
	[200, 6750],
	[3628.5714285714284, 9450],
	[7057.142857142857, 8100.000000000001],
	[10485.714285714286, 6750],
	[13914.285714285712, 9450],
	[17342.85714285714, 8100.000000000001],
	[20771.428571428572, 6750],
	[24200, 9450],
	[27628.571428571428, 8100.000000000001],
	[31057.14285714286, 6750],
	[0, 6000, 0.5333475181462025],
	[6000, 12000, 0.5333475181462025],
	[12000, 18000, 0.5333475181462025],
	[18000, 24000, 0.5333475181462025],
	[24000, 30000, 0.5333475181462025],
	[30000, 36000, 0.5333475181462025]
];
const VARIABLE = [
	[3000, 20999.999999999996],
	[1914.2857142857142, 6299.999999999999],
	[5342.857142857143, 5249.999999999999],
	[8771.42857142857, 7349.999999999999],
	[12200, 6299.999999999999],
	[15628.571428571428, 5249.999999999999],
	[19057.14285714286, 7349.999999999999],
	[22485.714285714283, 6299.999999999999],
	[25914.285714285714, 5249.999999999999],
	[29342.85714285714, 7349.999999999999],
	[32771.42857142857, 6299.999999999999]
];

const toLoad = (v: number[], action: Load['action'], k = 1): Load =>
	v.length === 2
		? { kind: 'point', x: v[0], value: v[1] * k, action }
		: { kind: 'uniform', from: v[0], to: v[1], value: v[2], action };

function makeProblem(k: number): CollapseProblem {
	return {
		beam: {
			spans: [6000, 6000, 6000, 6000, 6000, 6000],
			supports: ['pin', 'pin', 'pin', 'pin', 'pin', 'pin', 'pin'],
			joints: ['continuous', 'continuous', 'continuous', 'continuous', 'continuous']
		},
		capacity: [0, 1, 2, 3, 4, 5].map((i) => ({
			from: 6000 * i,
			to: 6000 * (i + 1),
			sagging: MP,
			hogging: MP
		})),
		fixedLoads: FIXED.map((v) => toLoad(v, 'permanent')),
		variableLoads: VARIABLE.map((v) => toLoad(v, 'temporary', k))
	};
}

/** Deflection of the span-1 mechanism (peak 1 under x = 3000 mm, zero at A and B). */
const shape = (x: number) => (x <= 0 || x >= 6000 ? 0 : x <= 3000 ? x / 3000 : (6000 - x) / 3000);

/** Work of the loads through the mechanism (line loads: the triangle's area times w). */
function work(list: number[][]): number {
	let s = 0;
	for (const v of list) {
		if (v.length === 2) s += v[1] * shape(v[0]);
		else if (v[0] < 6000) s += v[2] * 3000 * (Math.min(v[1], 6000) === 6000 ? 1 : NaN);
	}
	return s;
}

describe('a rebuilt simplex basis that lost balance', () => {
	it('still gives the certified beam mechanism in span 1', () => {
		const r = solveCollapse(makeProblem(1));
		expect(r.status).toBe('mechanism');
		if (r.status !== 'mechanism') return;
		expect(r.certified).toBe(true);
		// Rotations: 2/3000 under the load, 1/3000 at B, per unit peak deflection.
		const lambda = ((3 * MP) / 3000 - work(FIXED)) / work(VARIABLE);
		expectRel(r.loadFactor, lambda, 1e-9);
	});
	it('scales as 1/k when the variable loads are multiplied by k', () => {
		const one = solveCollapse(makeProblem(1));
		const big = solveCollapse(makeProblem(1000));
		if (one.status !== 'mechanism' || big.status !== 'mechanism') throw new Error('no mechanism');
		expectRel(big.loadFactor * 1000, one.loadFactor, 1e-9);
	});
});
