/**
 * The governing capacity curve runs the same design check as the answer at each position, but
 * leaves out what cannot decide it. A deflection limit the settings make deciding must still
 * count there (invented beam: 9 m simply supported UB 305x165x40, flange held throughout, a
 * light existing load and an 8 kN proposed point load, where deflection under all loads is
 * the first limit).
 */
import { describe, expect, it } from 'vitest';
import { checkCase } from '../../../src/lib/engine/index';

const beam = (deflectionGoverns: boolean) => ({
	format: 'hingepoint.case',
	version: 1,
	beam: {
		spans: [9],
		supports: ['pin', 'pin'],
		section: { designation: 'UB 305x165x40' },
		grade: 'S275',
		selfWeight: false,
		restraint: { lateral: 'continuous' }
	},
	loads: [
		{ kind: 'uniform', from: 0, to: 9, value: 2, action: 'permanent' },
		{ kind: 'point', x: 3.5, value: 8, action: 'temporary' }
	],
	...(deflectionGoverns ? { deflectionGoverns: true } : {})
});

describe('governing capacity curve', () => {
	it('counts deflection when the settings make it deciding, and agrees with the answer', () => {
		const out = checkCase(beam(true), { curve: true });
		expect(out.ok).toBe(true);
		if (!out.ok) return;
		const { answer, capacityCurve } = out.report;
		expect(answer.governing?.id).toBe('deflection-total');
		const here = capacityCurve!.points.find((p) => Math.abs(p.x - 3.5) < 1e-9);
		expect(here?.governing).toBe('deflection-total');
		expect(here?.p).toBe(answer.allowable[0].value);
		expect(capacityCurve!.min?.governing?.id).toBe('deflection-total');
	});

	it('leaves deflection out when it is only reported', () => {
		const out = checkCase(beam(false), { curve: true });
		expect(out.ok).toBe(true);
		if (!out.ok) return;
		const { answer, capacityCurve } = out.report;
		expect(answer.governing?.id).not.toMatch(/^deflection/);
		for (const p of capacityCurve!.points) expect(p.governing ?? '').not.toMatch(/^deflection/);
		const here = capacityCurve!.points.find((p) => Math.abs(p.x - 3.5) < 1e-9);
		expect(here?.p).toBe(answer.allowable[0].value);
	});
});
