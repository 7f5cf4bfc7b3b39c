/**
 * Small numerical helpers of the checks: symmetric eigenvalues (Golub & Van Loan, Matrix
 * Computations, 8.5, the cyclic Jacobi method), the bracketed multiplier search, and the moment
 * inside a segment by statics (textbook free-moment closed forms, e.g. Roark Table 8.1).
 */
import { describe, expect, it } from 'vitest';
import { computeSymmetricEigenvalues } from '../../../src/lib/engine/checks/symmetric-eigen';
import { findMultiplierAtCapacity } from '../../../src/lib/engine/checks/root-find';
import { computeSegmentMoment } from '../../../src/lib/engine/checks/segment-moment';
import { expectRel as expectRelWithin } from '../../support/expect-rel';

// Absolute slack for eigen- and root values that are exactly zero.
const expectRel = (actual: number, expected: number, rel: number): void =>
	expectRelWithin(actual, expected, rel, { absolute: 1e-12 });

describe('computeSymmetricEigenvalues', () => {
	it('[[2, 1], [1, 2]] has eigenvalues 1 and 3 (closed form (a ± b))', () => {
		const e = computeSymmetricEigenvalues(Float64Array.from([2, 1, 1, 2]), 2);
		expectRel(e[0], 1, 1e-12);
		expectRel(e[1], 3, 1e-12);
	});

	it('the path-graph Laplacian tridiag(−1, 2, −1) of size n has 2 − 2cos(kπ/(n+1))', () => {
		const n = 12;
		const a = new Float64Array(n * n);
		for (let i = 0; i < n; i++) {
			a[i * n + i] = 2;
			if (i > 0) a[i * n + i - 1] = a[(i - 1) * n + i] = -1;
		}
		const e = computeSymmetricEigenvalues(a, n);
		e.forEach((v, k) => expectRel(v, 2 - 2 * Math.cos(((k + 1) * Math.PI) / (n + 1)), 1e-10));
	});

	it('refuses a matrix of the wrong size and leaves its input unchanged', () => {
		expect(() => computeSymmetricEigenvalues(new Float64Array(3), 2)).toThrow(/n×n/);
		const a = Float64Array.from([1, 2, 2, 1]);
		computeSymmetricEigenvalues(a, 2);
		expect([...a]).toEqual([1, 2, 2, 1]);
	});
});

describe('findMultiplierAtCapacity', () => {
	it('solves an affine utilisation exactly: 0.2 + 0.4t = 1 at t = 2', () => {
		expectRel(findMultiplierAtCapacity({ utilisation: (t) => 0.2 + 0.4 * t })!, 2, 1e-6);
	});

	it('returns 0 when the fixed loads alone fail the check', () => {
		expect(findMultiplierAtCapacity({ utilisation: (t) => 1.2 + t })).toBe(0);
	});

	it('returns null when the temporary load never matters', () => {
		expect(findMultiplierAtCapacity({ utilisation: () => 0.5 })).toBeNull();
	});

	it('handles a non-linear utilisation: √(0.25 + t²) = 1 at t = √0.75', () => {
		expectRel(
			findMultiplierAtCapacity({ utilisation: (t) => Math.sqrt(0.25 + t * t) })!,
			Math.sqrt(0.75),
			1e-6
		);
	});

	it('refuses NaN (a broken invariant)', () => {
		expect(() => findMultiplierAtCapacity({ utilisation: () => NaN })).toThrow(/invariant/);
	});
});

describe('computeSegmentMoment (statics)', () => {
	const L = 6000;
	it('UDL: wx(L − x)/2', () => {
		const seg = {
			length: L,
			momentStart: 0,
			momentEnd: 0,
			loads: [{ kind: 'line' as const, from: 0, to: L, start: 4, end: 4 }]
		};
		for (const x of [0, 1000, 3000, 4500])
			expectRel(computeSegmentMoment(seg, x), (4 * x * (L - x)) / 2, 1e-12);
	});

	it('point load P at a: Pab/L under the load', () => {
		const seg = {
			length: L,
			momentStart: 0,
			momentEnd: 0,
			loads: [{ kind: 'point' as const, x: 2000, value: 10e3 }]
		};
		expectRel(computeSegmentMoment(seg, 2000), (10e3 * 2000 * 4000) / L, 1e-12);
	});

	it('triangular load 0 → w: largest moment wL²/(9√3) at L/√3', () => {
		const seg = {
			length: L,
			momentStart: 0,
			momentEnd: 0,
			loads: [{ kind: 'line' as const, from: 0, to: L, start: 0, end: 6 }]
		};
		expectRel(computeSegmentMoment(seg, L / Math.sqrt(3)), (6 * L * L) / (9 * Math.sqrt(3)), 1e-10);
	});

	it('adds the straight line between the end moments', () => {
		const seg = { length: L, momentStart: -30e6, momentEnd: 10e6, loads: [] };
		expectRel(computeSegmentMoment(seg, 1500), -30e6 + (40e6 * 1500) / L, 1e-12);
	});
});
