/**
 * Regression fixtures found by the random-case property (invented beams, demo data). Each test
 * names the bug that shipped.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { checkCase } from '../../../src/lib/engine/index';

const load = (name: string): unknown =>
	JSON.parse(readFileSync(`test/fixtures/cases/${name}.json`, 'utf8'));

describe('shear-reduced plastic check', () => {
	it('reads shear inside the span, never past the beam end (shipped: RangeError at x = 24400 mm)', () => {
		const out = checkCase(load('regression-shear-read-beyond-end'));
		expect(out.ok && out.report.answer.verdict).toBe('pass');
	});

	it('keeps the reduced hinge capacity positive (shipped: capacity-not-positive thrown)', () => {
		const out = checkCase(load('regression-shear-zeroes-capacity'));
		expect(out.ok && out.report.design.route.route).toBe('plastic');
		if (out.ok)
			for (const r of out.report.checks) expect(Number.isFinite(r.utilisation)).toBe(true);
	});
});
