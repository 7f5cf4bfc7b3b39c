/**
 * The buckling check needs only the largest eigenvalue of the energy matrix, found by
 * Householder reduction and Sturm bisection (Golub & Van Loan, Matrix Computations, 8.3.1 and
 * 8.4.1). It must agree with the full cyclic Jacobi solve (Golub & Van Loan 8.5), which the
 * check used before: on random symmetric matrices to round-off of the matrix norm, and on random
 * segments (end moments, point and line loads, load height, several load groups weighted as
 * an arrangement and a multiplier would weight them) to 1e-9 on Mcr.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeLargestEigenvalue } from '../../src/lib/engine/checks/largest-eigenvalue';
import { prepareCriticalMoment } from '../../src/lib/engine/checks/mcr';
import { computeSymmetricEigenvalues } from '../../src/lib/engine/checks/symmetric-eigen';
import { expectRel } from '../support/expect-rel';
import { arbitrarySegmentParts } from '../support/segment-loads';

const jacobiLargest = (a: Float64Array, n: number) => computeSymmetricEigenvalues(a, n).at(-1) ?? 0;

/** The Jacobi solve of a matrix given, as the Mcr solve gives it, by its lower triangle. */
const jacobiFromLower = (a: Float64Array, n: number) => {
	const full = Float64Array.from(a);
	for (let i = 0; i < n; i++) for (let j = 0; j < i; j++) full[j * n + i] = a[i * n + j];
	return jacobiLargest(full, n);
};

const matrix = fc
	.record({
		n: fc.integer({ min: 1, max: 26 }),
		entries: fc.array(
			fc.integer({ min: -1e6, max: 1e6 }).map((v) => v / 1e6),
			{ minLength: 676, maxLength: 676 }
		),
		scale: fc.constantFrom(1e-8, 1, 1e6),
		zeroBlock: fc.boolean()
	})
	.map(({ n, entries, scale, zeroBlock }) => {
		const a = new Float64Array(n * n);
		for (let i = 0; i < n; i++) {
			for (let j = 0; j <= i; j++) {
				// The buckling matrices have a zero block (no a–a coupling): cover that shape too.
				const v = zeroBlock && i < n / 2 && j < n / 2 ? 0 : entries[i * 26 + j] * scale;
				a[i * n + j] = v;
				a[j * n + i] = v;
			}
		}
		return { a, n };
	});

const segmentCase = fc.record({
	parts: arbitrarySegmentParts({ minLength: 1500, maxParts: 4, maxLoads: 3 }),
	weights: fc.array(fc.constantFrom(0, 0.9, 1, 1.05, 1.35, 1.5, 2.7), {
		minLength: 4,
		maxLength: 4
	}),
	zg: fc.constantFrom(-150, 0, 150)
});

describe('largest eigenvalue by tridiagonal reduction', () => {
	it('matches the full Jacobi solve on random symmetric matrices', () => {
		fc.assert(
			fc.property(matrix, ({ a, n }) => {
				let norm = 0;
				for (const v of a) norm += v * v;
				norm = Math.sqrt(norm);
				const fast = computeLargestEigenvalue(a, n);
				const full = jacobiLargest(a, n);
				expect(Math.abs(fast - full)).toBeLessThanOrEqual(1e-13 * norm);
				// Only the lower triangle is read: the solve of the weighted sum fills no more.
				const lower = Float64Array.from(a, (v, k) => (k % n > Math.floor(k / n) ? NaN : v));
				expect(computeLargestEigenvalue(lower, n)).toBe(fast);
			}),
			{ numRuns: 300 }
		);
	});

	it('gives the same Mcr as the Jacobi solve on random segments and weights', () => {
		fc.assert(
			fc.property(segmentCase, (c) => {
				const parts = c.parts;
				// 305x165x40 UB stiffnesses, from memory (order of magnitude is all that matters).
				const stiffness = {
					EIz: 210e3 * 764e4,
					GIt: 81e3 * 14.7e4,
					EIw: 210e3 * 0.164e12,
					zg: c.zg
				};
				const weights = parts.map((_, i) => c.weights[i]);
				const fast = prepareCriticalMoment({ ...stiffness, parts }).at(weights);
				const full = prepareCriticalMoment({
					...stiffness,
					parts,
					largestEigenvalue: jacobiFromLower
				}).at(weights);
				if (full === null) {
					expect(fast).toBeNull();
					return;
				}
				expect(fast).not.toBeNull();
				expectRel(fast!.mcr, full.mcr, 1e-9);
				expect(fast!.mMax).toBe(full.mMax);
			}),
			{ numRuns: 200 }
		);
	});
});
