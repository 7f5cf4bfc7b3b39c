/**
 * Relative-tolerance assertion used by the validation tests:
 * |actual − expected| ≤ rel·|expected| + absolute. A null or undefined actual fails.
 */
import { expect } from 'vitest';

export interface RelativeToleranceOptions {
	/** Keep going after a mismatch so one run lists every failing row (table checks). */
	soft?: boolean;
	/** Absolute slack for expected values at or near zero. */
	absolute?: number;
}

export function expectRel(
	actual: number | null | undefined,
	expected: number,
	rel = 1e-9,
	options: RelativeToleranceOptions = {}
): void {
	const check = options.soft ? expect.soft : expect;
	if (actual === null || actual === undefined) {
		check(actual, `expected a number near ${expected}`).not.toBeNull();
		check(actual).toBeDefined();
		return;
	}
	const limit = rel * Math.abs(expected) + (options.absolute ?? 0);
	check(Math.abs(actual - expected), `${actual} vs ${expected}`).toBeLessThanOrEqual(limit);
}

/** expectRel that records the mismatch and lets the test go on (for whole-table checks). */
export function expectRelSoft(actual: number, expected: number, rel: number): void {
	expectRel(actual, expected, rel, { soft: true });
}
