/**
 * Share text: a short message under 600 characters and a long form, both plain text (no
 * characters a messaging app renders as markup). Demo data, invented.
 */
import { describe, expect, it } from 'vitest';
import { isPlainText, toPlainText } from '../../../src/lib/engine/report/plain-text';
import {
	SHORT_SUMMARY_LIMIT,
	writeLongSummary,
	writeShortSummary,
	type SummaryInput
} from '../../../src/lib/engine/report/summary';

const demo: SummaryInput = {
	title: 'Demo: hoist on the *old* [store] beam_1',
	place: 'Unit 4 # yard',
	date: '1 Dec 2026',
	spans: [6],
	supports: ['pin', 'pin'],
	section: 'UB 305x165x40',
	grade: 'S275',
	loads: [
		{ action: 'permanent', kind: 'uniform', value: 4, from: 0, to: 6 },
		{ action: 'temporary', kind: 'point', value: 10, at: 3, label: 'hoist' }
	],
	factorSet: 'EN 1990 6.10',
	factors: { gammaGsup: 1.35, gammaT: 1.5 },
	verdict: 'pass',
	routeReasons: ['Class 1 section > plastic collapse'],
	governing: { label: 'Bending', utilisation: 0.27 },
	reserve: 554,
	allowable: ['65.4 kN (load 2, hoist)'],
	checks: [{ label: 'Shear', clause: 'EN 1993-1-1 6.2.6', utilisation: 0.07, pass: true, level: 'governing', details: ['VEd 23.7 kN'] }],
	notice: 'Screening aid only. The engineer of record decides.',
	notices: [],
	assumptions: ['Ductile steel.']
};

describe('toPlainText', () => {
	it('removes every markup character', () => {
		const out = toPlainText('*b* _i_ `c` # h ~s~ > q [l](u) <x> |t|');
		expect(isPlainText(out)).toBe(true);
		expect(out).not.toMatch(/\]\(/);
	});
});

describe('writeShortSummary', () => {
	it('fits a message, carries the date passed in, the verdict, the governing check and the notice', () => {
		const s = writeShortSummary(demo);
		expect(s.length).toBeLessThanOrEqual(SHORT_SUMMARY_LIMIT);
		expect(s).toContain('1 Dec 2026');
		expect(s).toContain('PASS');
		expect(s).toContain('Bending');
		expect(s).toContain('65.4 kN');
		expect(s).toContain('engineer of record');
		expect(isPlainText(s)).toBe(true);
	});

	it('drops detail rather than run long', () => {
		const many = { ...demo, loads: Array.from({ length: 40 }, () => demo.loads[1]) };
		const s = writeShortSummary(many);
		expect(s.length).toBeLessThanOrEqual(SHORT_SUMMARY_LIMIT);
		expect(s).toContain('PASS');
	});
});

describe('writeLongSummary', () => {
	it('lists every load, factor, check and assumption as plain text', () => {
		const s = writeLongSummary(demo);
		expect(s).toContain('hoist temporary 10 kN at 3 m');
		expect(s).toContain('gammaGsup 1.35');
		expect(s).toContain('Shear (EN 1993-1-1 6.2.6): 7 % ok; VEd 23.7 kN');
		expect(s).toContain('Ductile steel.');
		expect(isPlainText(s)).toBe(true);
	});
});
