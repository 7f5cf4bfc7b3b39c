/**
 * Our own textbook-style collapse cases (upward loads, overhangs loaded on both sides, simple
 * joints, changes of section inside a span, unequal sagging and hogging resistance), each worked
 * beside its check by the mechanism method and statics as taught in B.G. Neal, "The Plastic
 * Methods of Structural Analysis" (3rd ed., 1977), and M.R. Horne, "Plastic Theory of Structures"
 * (method from memory; the numbers are derived here, not quoted). Closed forms are computed in the
 * test; kN, m, kN·m; loads of 1 kN or 1 kN/m times λ.
 */
import { describe, expect, it } from 'vitest';
import { solveCollapse } from '../../src/lib/engine/collapse';
import { makeProblem, relativeError, type ProblemSpec } from '../unit/collapse/builders';

const TOL = 1e-9;

function expectLambda(spec: ProblemSpec, expected: number) {
	const r = solveCollapse(makeProblem(spec));
	if (r.status !== 'mechanism') throw new Error(`expected a mechanism, got ${r.status}`);
	expect(r.certified).toBe(true);
	expect(relativeError(r.loadFactor, expected)).toBeLessThan(TOL);
	return r;
}

describe('upward loads and unequal sagging/hogging resistance', () => {
	const seg = (sag: number, hog: number, L: number) => [{ from: 0, to: L, sag, hog }];
	it('propped cantilever, upward central load: W = (Ms + 2Mh)/(L/2)', () => {
		// Upward load: sagging hinge at the fixed end (θ), hogging hinge under the load (2θ);
		// work W·θ·L/2 = Ms·θ + Mh·2θ. Downward it would be (Mh + 2Ms)/(L/2).
		const [Ms, Mh, L] = [80, 100, 6];
		const r = expectLambda(
			{ spans: [L], supports: ['fixed', 'pin'], Mp: seg(Ms, Mh, L), variable: [{ P: -1, at: 3 }] },
			(Ms + 2 * Mh) / (L / 2)
		);
		expect(r.hinges.map((h) => Math.sign(h.moment))).toEqual([1, -1]);
		expectLambda(
			{ spans: [L], supports: ['fixed', 'pin'], Mp: seg(Ms, Mh, L), variable: [{ P: 1, at: 3 }] },
			(Mh + 2 * Ms) / (L / 2)
		);
	});
	it('cantilever with an upward tip load hinges in sagging at the root: W = Ms/L', () => {
		expectLambda(
			{
				spans: [4],
				supports: ['fixed', 'free'],
				Mp: seg(80, 100, 4),
				variable: [{ P: -1, at: 4 }]
			},
			80 / 4
		);
	});
	it('fixed-ended span, uniform load, Ms ≠ Mh: w = 8(Ms + Mh)/L²', () => {
		// Rotations 2Δ/L at each end (hogging), 4Δ/L at midspan (sagging); work w·L·Δ/2.
		expectLambda(
			{
				spans: [6],
				supports: ['fixed', 'fixed'],
				Mp: seg(100, 60, 6),
				variable: [{ w: 1, from: 0, to: 6 }]
			},
			(8 * (100 + 60)) / 36
		);
	});
});

describe('overhangs', () => {
	it('back span uniform load with a fixed tip load on the overhang (relieving)', () => {
		// M(x) = w·x(L − x)/2 − k·x with k = P·c/L; M_max = wL²/8 + k²/(2w) − kL/2 = Mp gives
		// (L²/8)w² − (kL/2 + Mp)w + k²/2 = 0; the larger root has its peak inside the span.
		const [L, c, P, Mp] = [6, 2, 20, 100];
		const k = (P * c) / L;
		const [a, b, cc] = [L ** 2 / 8, -((k * L) / 2 + Mp), k ** 2 / 2];
		const w = (-b + Math.sqrt(b * b - 4 * a * cc)) / (2 * a);
		const r = expectLambda(
			{
				spans: [L, c],
				supports: ['pin', 'pin', 'free'],
				Mp,
				fixed: [{ P, at: L + c }],
				variable: [{ w: 1, from: 0, to: L }]
			},
			w
		);
		expect(relativeError(r.hinges[0].x / 1000, L / 2 - k / w)).toBeLessThan(1e-9);
		// The overhang turns with the right-hand piece of span 1 (its fixed load does negative work).
		expect(r.mechanism.name).toBe('combined mechanism over spans 1–2');
	});
	it('load down in the back span and up at the tip: one hinge, both spans move, P = Mp/2.5', () => {
		// Hinge at 3 m (Δ): right piece turns Δ/3 about B, lifting the tip 2Δ/3;
		// work P(Δ + 2Δ/3) = Mp(Δ/3 + Δ/3). Statics: R_A = 5P/6, M(3) = 2.5P.
		const r = expectLambda(
			{
				spans: [6, 2],
				supports: ['pin', 'pin', 'free'],
				Mp: 100,
				variable: [
					{ P: 1, at: 3 },
					{ P: -1, at: 8 }
				]
			},
			100 / 2.5
		);
		expect(r.mechanism).toEqual({ name: 'combined mechanism over spans 1–2', spans: [0, 1] });
	});
	it('overhang at the left end with a tip load: W = Mp/c', () => {
		const r = expectLambda(
			{ spans: [1.5, 6], supports: ['free', 'pin', 'pin'], Mp: 90, variable: [{ P: 1, at: 0 }] },
			90 / 1.5
		);
		expect(r.mechanism.name).toBe('overhang root at support B');
		expect(r.reactions[0]).toBe(0);
	});
});

describe('simple joints, fixed interior supports and changes of section', () => {
	it('a simple joint turns two spans into two simple spans: w = 8Mp/L² of the longer', () => {
		expectLambda(
			{
				spans: [6, 4],
				supports: ['pin', 'pin', 'pin'],
				joints: ['simple'],
				Mp: 100,
				variable: [{ w: 1, from: 0, to: 10 }]
			},
			(8 * 100) / 36
		);
	});
	it('a fixed interior support makes the loaded span a propped cantilever', () => {
		const w = ((6 + 4 * Math.SQRT2) * 100) / 36;
		expectLambda(
			{
				spans: [6, 6],
				supports: ['pin', 'fixed', 'pin'],
				Mp: 100,
				variable: [{ w: 1, from: 0, to: 6 }]
			},
			w
		);
	});
	it('a hinge forms at a change of section in the weaker member (Horne)', () => {
		// Mp = 100 on [0, 4], 60 on [4, 6]; UDL: M(4) = 4w reaches 60 before M(3) = 4.5w reaches 100.
		const Mp = [
			{ from: 0, to: 4, sag: 100, hog: 100 },
			{ from: 4, to: 6, sag: 60, hog: 60 }
		];
		const r = expectLambda(
			{ spans: [6], supports: ['pin', 'pin'], Mp, variable: [{ w: 1, from: 0, to: 6 }] },
			60 / 4
		);
		expect(r.hinges.map((h) => h.x)).toEqual([4000]);
	});
	it('triangular load on a simple span: w₀ = 9√3·Mp/L², hinge at L/√3', () => {
		// R_A = w₀L/6, M(x) = w₀Lx/6 − w₀x³/(6L), peak at x = L/√3.
		const r = expectLambda(
			{
				spans: [6],
				supports: ['pin', 'pin'],
				Mp: 100,
				variable: [{ w1: 0, w2: 1, from: 0, to: 6 }]
			},
			(9 * Math.sqrt(3) * 100) / 36
		);
		expect(relativeError(r.hinges[0].x / 1000, 6 / Math.sqrt(3))).toBeLessThan(1e-9);
	});
});

describe('statuses', () => {
	it('fixed loads above the collapse load: fails-under-fixed, never a negative λ', () => {
		// Simple span: the fixed UDL's free moment 30·36/8 = 135 > Mp = 100.
		const r = solveCollapse(
			makeProblem({
				spans: [6],
				supports: ['pin', 'pin'],
				Mp: 100,
				fixed: [{ w: 30, from: 0, to: 6 }],
				variable: [{ P: 1, at: 3 }]
			})
		);
		expect(r.status).toBe('fails-under-fixed');
		if (r.status === 'fails-under-fixed')
			expect(relativeError(r.overstress, 135 / 100)).toBeLessThan(1e-9);
	});
	it('no variable load, or a load straight into a support: unbounded', () => {
		expect(
			solveCollapse(makeProblem({ spans: [6], supports: ['pin', 'pin'], Mp: 100, variable: [] }))
				.status
		).toBe('unbounded');
		expect(
			solveCollapse(
				makeProblem({
					spans: [6, 6],
					supports: ['pin', 'pin', 'pin'],
					Mp: 100,
					variable: [{ P: 1, at: 6 }]
				})
			).status
		).toBe('unbounded');
	});
});
