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

describe('a load a hair from a support', () => {
	it('does not read as failing under the existing loads (shipped: elastic bending factor 0)', () => {
		// A temporary point load 1e-160 m from a pinned end makes no bending moment (statics), so
		// bending never limits it; found by the elastic-bending property on the CI seed.
		const out = checkCase({
			format: 'hingepoint.case',
			version: 1,
			beam: {
				spans: [1.5, 1.809],
				supports: ['pin', 'pin', 'pin'],
				section: { designation: 'UB 305x165x40' },
				grade: 'S275',
				selfWeight: false
			},
			loads: [{ kind: 'point', x: 1.231994113661008e-160, value: 12, action: 'temporary' }]
		});
		expect(out.ok).toBe(true);
		if (!out.ok) return;
		const bending = out.report.checks.find((c) => c.id === 'bending');
		expect(bending?.multiplier).not.toBe(0);
		expect(out.report.answer.multiplier).not.toBe(0);
	});
});
