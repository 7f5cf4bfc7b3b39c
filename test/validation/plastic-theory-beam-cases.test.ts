/**
 * Collapse loads of single and continuous beams against closed forms of simple plastic theory.
 *
 * Sources: B.G. Neal, "The Plastic Methods of Structural Analysis" (3rd ed., 1977), and M.R. Horne,
 * "Plastic Theory of Structures" (1971/1979): the mechanism (virtual-work) method, the static
 * method and the propped-cantilever/continuous-beam results, recalled from memory. Every closed
 * form below is derived again beside its check by virtual work (external work of the loads =
 * Σ Mp·θ at the hinges) and confirmed by statics (a moment diagram in equilibrium with
 * |M| ≤ Mp), and is computed inside the test. Mp = 100 kN·m and L = 6 m unless stated.
 * Loads are 1 kN (or 1 kN/m) times λ, so λ reads directly in kN (or kN/m).
 */
import { describe, expect, it } from 'vitest';
import { solveCollapse, type CollapseResult } from '../../src/lib/engine/collapse';
import { makeProblem, relativeError, type ProblemSpec } from '../unit/collapse/builders';

const Mp = 100;
const L = 6;
/** λ must match the closed form to this relative tolerance (exact method, rounding only). */
const TOL = 1e-9;

function solve(spec: ProblemSpec): Extract<CollapseResult, { status: 'mechanism' }> {
	const r = solveCollapse(makeProblem(spec));
	if (r.status !== 'mechanism') throw new Error(`expected a mechanism, got ${r.status}`);
	return r;
}

function expectLambda(spec: ProblemSpec, expected: number) {
	const r = solve(spec);
	expect(r.certified).toBe(true);
	expect(relativeError(r.loadFactor, expected)).toBeLessThan(TOL);
	return r;
}

/** Hinge positions in m. */
const hingesAt = (r: { hinges: { x: number }[] }) => r.hinges.map((h) => h.x / 1000);

const SS: ProblemSpec['supports'] = ['pin', 'pin'];
const FF: ProblemSpec['supports'] = ['fixed', 'fixed'];
const PC: ProblemSpec['supports'] = ['fixed', 'pin'];
const C: ProblemSpec['supports'] = ['fixed', 'free'];

describe('simply supported span (Neal; Horne: single hinge, work equation)', () => {
	it('A1 central point load: W = 4Mp/L', () => {
		// Virtual work: W·Δ = Mp·(4Δ/L).
		const r = expectLambda(
			{ spans: [L], supports: SS, Mp, variable: [{ P: 1, at: 3 }] },
			(4 * Mp) / L
		);
		expect(hingesAt(r)).toEqual([3]);
	});
	it('A2 off-centre point load: W = Mp·L/(a·b)', () => {
		// Hinge rotation Δ(1/a + 1/b); statics W·a·b/L = Mp.
		for (const a of [2, 1.5]) {
			expectLambda(
				{ spans: [L], supports: SS, Mp, variable: [{ P: 1, at: a }] },
				(Mp * L) / (a * (L - a))
			);
		}
	});
	it('A3 full uniform load: w = 8Mp/L²', () => {
		const r = expectLambda(
			{ spans: [L], supports: SS, Mp, variable: [{ w: 1, from: 0, to: L }] },
			(8 * Mp) / L ** 2
		);
		expect(relativeError(hingesAt(r)[0], L / 2)).toBeLessThan(1e-9);
	});
	it('A4 equal loads at the third points: P = 3Mp/L', () => {
		expectLambda(
			{
				spans: [L],
				supports: SS,
				Mp,
				variable: [
					{ P: 1, at: 2 },
					{ P: 1, at: 4 }
				]
			},
			(3 * Mp) / L
		);
	});
	it('A5 trap: P at 1.5 m and 2P at 4 m collapses under 2P, P = 0.75Mp/2.375', () => {
		// Hinge under 2P: external (1.5/4 + 2)PΔ, internal Mp(1/4 + 1/2)Δ. Under P it would be 47.06.
		const r = expectLambda(
			{
				spans: [L],
				supports: SS,
				Mp,
				variable: [
					{ P: 1, at: 1.5 },
					{ P: 2, at: 4 }
				]
			},
			(0.75 * Mp) / 2.375
		);
		expect(hingesAt(r)).toEqual([4]);
		expect(r.loadFactor).not.toBeCloseTo((0.8889 * Mp) / 1.8889, 1);
	});
	it('A6/A7 partial uniform load: hinge at the zero-shear point a₁ + R_A/w', () => {
		// Statics: R_A = w·c·(L − x̄)/L, M_max = R_A·a₁ + R_A²/(2w) = Mp.
		for (const [a1, a2] of [
			[0, 3],
			[1, 4]
		]) {
			const c = a2 - a1;
			const RA = (c * (L - (a1 + a2) / 2)) / L; // per unit w
			const w = Mp / (RA * a1 + RA ** 2 / 2);
			const r = expectLambda(
				{ spans: [L], supports: SS, Mp, variable: [{ w: 1, from: a1, to: a2 }] },
				w
			);
			expect(relativeError(hingesAt(r)[0], a1 + RA)).toBeLessThan(1e-9);
		}
	});
	it('A23 fixed uniform load + variable central load: Q = 4Mp/L − gL/2', () => {
		const g = 5;
		expectLambda(
			{
				spans: [L],
				supports: SS,
				Mp,
				fixed: [{ w: g, from: 0, to: L }],
				variable: [{ P: 1, at: 3 }]
			},
			(4 * Mp) / L - (g * L) / 2
		);
	});
	it('A24 trap: fixed g = 20 kN/m + variable Q at 1 m hinges at 6 − √10, Q = 120√10 − 360', () => {
		// Q(x) = 600/(6 − x) − 60x is least where (6 − x)² = 10; under the load it would be 60 kN.
		const r = expectLambda(
			{
				spans: [L],
				supports: SS,
				Mp,
				fixed: [{ w: 20, from: 0, to: L }],
				variable: [{ P: 1, at: 1 }]
			},
			120 * Math.sqrt(10) - 360
		);
		expect(relativeError(hingesAt(r)[0], 6 - Math.sqrt(10))).toBeLessThan(1e-9);
	});
});

describe('fixed-ended span (Neal; Horne: three hinges)', () => {
	it('A8 central load W = 8Mp/L, A9 load at a: W = 2Mp·L/(a·b)', () => {
		const r = expectLambda(
			{ spans: [L], supports: FF, Mp, variable: [{ P: 1, at: 3 }] },
			(8 * Mp) / L
		);
		expect(hingesAt(r)).toEqual([0, 3, 6]);
		expectLambda(
			{ spans: [L], supports: FF, Mp, variable: [{ P: 1, at: 2 }] },
			(2 * Mp * L) / (2 * 4)
		);
	});
	it('A10 uniform load w = 16Mp/L²; A11 third-point loads P = 6Mp/L', () => {
		expectLambda(
			{ spans: [L], supports: FF, Mp, variable: [{ w: 1, from: 0, to: L }] },
			(16 * Mp) / L ** 2
		);
		expectLambda(
			{
				spans: [L],
				supports: FF,
				Mp,
				variable: [
					{ P: 1, at: 2 },
					{ P: 1, at: 4 }
				]
			},
			(6 * Mp) / L
		);
	});
});

describe('propped cantilever (Neal; Horne: the hinge under a uniform load is not at midspan)', () => {
	it('A12 central load W = 6Mp/L; A13 load at a from the fixed end W = Mp(L + b)/(ab)', () => {
		expectLambda({ spans: [L], supports: PC, Mp, variable: [{ P: 1, at: 3 }] }, (6 * Mp) / L);
		for (const a of [2, 4]) {
			const b = L - a;
			expectLambda(
				{ spans: [L], supports: PC, Mp, variable: [{ P: 1, at: a }] },
				(Mp * (L + b)) / (a * b)
			);
		}
	});
	it('A14 uniform load: w = (6 + 4√2)Mp/L², hinge (√2 − 1)L from the pinned end', () => {
		// w(x) = 2Mp(L + x)/(L·x·(L − x)) is least at x² + 2Lx − L² = 0.
		const r = expectLambda(
			{ spans: [L], supports: PC, Mp, variable: [{ w: 1, from: 0, to: L }] },
			((6 + 4 * Math.SQRT2) * Mp) / L ** 2
		);
		const x = hingesAt(r);
		expect(x[0]).toBe(0);
		expect(relativeError(x[1], L - (Math.SQRT2 - 1) * L)).toBeLessThan(1e-9);
		// The midspan-hinge mechanism gives 33.33 kN/m, an unsafe answer the solver must not return.
		expect(r.loadFactor).toBeLessThan(((2 * Mp * (L + 3)) / (L * 3 * 3)) * (1 - 1e-3));
	});
});

describe('cantilevers (statically determinate: root moment = Mp)', () => {
	it('A15 tip load Mp/L, A16 uniform 2Mp/L², A17 load at 4 m Mp/a', () => {
		const r = expectLambda({ spans: [L], supports: C, Mp, variable: [{ P: 1, at: 6 }] }, Mp / L);
		expect(r.mechanism.name).toBe('cantilever root');
		expectLambda(
			{ spans: [L], supports: C, Mp, variable: [{ w: 1, from: 0, to: L }] },
			(2 * Mp) / L ** 2
		);
		expectLambda({ spans: [L], supports: C, Mp, variable: [{ P: 1, at: 4 }] }, Mp / 4);
	});
	it('A17b fixed g = 2 kN/m + variable tip load: Q = (Mp − gL²/2)/L', () => {
		expectLambda(
			{
				spans: [L],
				supports: C,
				Mp,
				fixed: [{ w: 2, from: 0, to: L }],
				variable: [{ P: 1, at: 6 }]
			},
			(Mp - (2 * L ** 2) / 2) / L
		);
	});
});

describe('continuous beams (Neal; Horne: independent beam mechanisms, weaker member at a support)', () => {
	const w14 = ((6 + 4 * Math.SQRT2) * Mp) / L ** 2;
	it('A18 two spans, uniform load on both or on one: the propped-cantilever value', () => {
		const both = expectLambda(
			{ spans: [6, 6], supports: ['pin', 'pin', 'pin'], Mp, variable: [{ w: 1, from: 0, to: 12 }] },
			w14
		);
		expect(both.hinges.some((h) => h.x === 6000 && h.moment < 0)).toBe(true);
		const one = expectLambda(
			{ spans: [6, 6], supports: ['pin', 'pin', 'pin'], Mp, variable: [{ w: 1, from: 0, to: 6 }] },
			w14
		);
		expect(relativeError(hingesAt(one)[0], (Math.SQRT2 - 1) * L)).toBeLessThan(1e-9);
		expect(one.mechanism.name).toBe('beam mechanism in span 1');
	});
	it('A19 two spans, central load in each: W = 6Mp/L', () => {
		expectLambda(
			{
				spans: [6, 6],
				supports: ['pin', 'pin', 'pin'],
				Mp,
				variable: [
					{ P: 1, at: 3 },
					{ P: 1, at: 9 }
				]
			},
			(6 * Mp) / L
		);
	});
	it('A20 three spans, uniform load on all: end spans govern', () => {
		const r = expectLambda(
			{
				spans: [6, 6, 6],
				supports: ['pin', 'pin', 'pin', 'pin'],
				Mp,
				variable: [{ w: 1, from: 0, to: 18 }]
			},
			w14
		);
		expect(r.loadFactor).toBeLessThan((16 * Mp) / L ** 2);
	});
	it('A21 trap: different Mp, the support hinge forms in the weaker member: W = (100 + 2·120)/4', () => {
		const r = expectLambda(
			{
				spans: [6, 8],
				supports: ['pin', 'pin', 'pin'],
				Mp: [100, 120],
				variable: [
					{ P: 1, at: 3 },
					{ P: 1, at: 10 }
				]
			},
			(100 + 2 * 120) / 4
		);
		expect(hingesAt(r)).toEqual([6, 10]);
		expect(r.mechanism.name).toBe('beam mechanism in span 2');
		expect(relativeError(r.loadFactor, 90)).toBeGreaterThan(0.05); // 120 at B would give 90 (unsafe)
	});
	it('A22 trap: different Mp, uniform load: w = 2[(M₁ + 2M₂) + √((M₁ + 2M₂)² − M₁²)]/L²', () => {
		const [M1, M2, Lb] = [100, 150, 8];
		const s = M1 + 2 * M2;
		const w = (2 * (s + Math.sqrt(s * s - M1 * M1))) / Lb ** 2;
		const r = expectLambda(
			{
				spans: [6, 8],
				supports: ['pin', 'pin', 'pin'],
				Mp: [100, 150],
				variable: [{ w: 1, from: 0, to: 14 }]
			},
			w
		);
		// Hinge at R_C/w from C, with R_C = wL/2 − M₁/L.
		const RC = (w * Lb) / 2 - M1 / Lb;
		expect(relativeError(hingesAt(r)[1], 14 - RC / w)).toBeLessThan(1e-9);
	});
	it('A25 back span with an overhang, tip load: W = Mp/c', () => {
		const r = expectLambda(
			{ spans: [6, 2], supports: ['pin', 'pin', 'free'], Mp, variable: [{ P: 1, at: 8 }] },
			Mp / 2
		);
		expect(r.mechanism.name).toBe('overhang root at support B');
		expect(r.reactions[2]).toBe(0);
	});
});
