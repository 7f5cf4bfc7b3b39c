/**
 * Share text: a short message under 600 characters and a long form, both plain text (no
 * characters a messaging app renders as markup). Demo data, invented.
 */
import { describe, expect, it } from 'vitest';
import { checkCase, type CaseFile } from '../../../src/lib/engine';
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
	checks: [
		{
			label: 'Shear',
			clause: 'EN 1993-1-1 6.2.6',
			utilisation: 0.07,
			pass: true,
			level: 'governing',
			details: ['VEd 23.7 kN']
		}
	],
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
		expect(s.length).toBeLessThan(SHORT_SUMMARY_LIMIT);
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
		expect(s.length).toBeLessThan(SHORT_SUMMARY_LIMIT);
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

/** US customary from the definitions: 1 in = 25.4 mm, 1 lbf = 0.453 592 37 kg × 9.806 65 m/s². */
const FT_M = 12 * 0.0254;
const KIP_KN = (1000 * 0.45359237 * 9.80665) / 1000;
const sig3 = (v: number) => String(Number(v.toPrecision(3)));

describe('summary units', () => {
	const restrained: CaseFile = {
		format: 'hingepoint.case',
		version: 1,
		title: 'Demo: hoist beam (invented)',
		beam: {
			spans: [6],
			supports: ['pin', 'pin'],
			section: { designation: 'UB 305x165x40' },
			grade: 'S275',
			restraint: { lateral: [3], loadHeight: 'top-flange' }
		},
		loads: [
			{ kind: 'uniform', from: 0, to: 6, value: 4, action: 'permanent' },
			{ kind: 'point', x: 3, value: 10, action: 'temporary', label: 'hoist' }
		]
	};
	const run = (units: 'si' | 'us') => {
		const out = checkCase(restrained, { units });
		if (!out.ok) throw new Error('the demo case is valid');
		return out.report;
	};
	const si = run('si');
	const us = run('us');

	it('writes the entered loads and spans in kip and ft (10 kN → 2.25 kip, 6 m → 19.7 ft)', () => {
		expect(sig3(10 / KIP_KN)).toBe('2.25');
		expect(sig3(6 / FT_M)).toBe('19.7');
		expect(si.summary.long).toContain('hoist temporary 10 kN at 3 m');
		expect(us.summary.long).toContain(`hoist temporary 2.25 kip at ${sig3(3 / FT_M)} ft`);
		expect(us.summary.long).toContain('Beam: 19.7 ft (pin-pin)');
		expect(us.summary.long).toContain(
			`permanent ${sig3(4 / (KIP_KN / FT_M))} kip/ft from 0 to 19.7 ft`
		);
		expect(us.summary.long).toContain('Units: US customary');
		// Route reasons, notices and assumptions too (see test/unit/report/report-units.test.ts).
		const lines = us.summary.long.split('\n');
		expect(lines.length).toBeGreaterThan(10);
		expect(us.summary.long).not.toMatch(/\d (kN|kNm|kN\/m|m|mm|MPa)\b/);
	});

	it('gives the same largest proposed load, converted from the SI answer', () => {
		const allowed = si.answer.allowable[0].value;
		expect(allowed).not.toBeNull();
		expect(si.summary.short).toContain(
			`Largest proposed load: ${sig3(allowed!)} kN (load 2, hoist)`
		);
		expect(us.summary.short).toContain(
			`Largest proposed load: ${sig3(allowed! / KIP_KN)} kip (load 2, hoist)`
		);
	});

	it('writes moments in kip·ft and the restraint position in ft', () => {
		const bending = si.checks.find((c) => typeof c.mEd === 'number');
		expect(bending).toBeDefined();
		expect(us.summary.long).toContain(
			`MEd ${sig3((bending!.mEd as number) / (KIP_KN * FT_M))} kip·ft`
		);
		expect(si.summary.long).toContain('held laterally at the supports and at 3 m');
		expect(us.summary.long).toContain(
			`at the supports and at ${Number((3 / FT_M).toPrecision(4))} ft`
		);
		expect(us.summary.short).toContain('Restraint: compression flange held laterally');
	});

	it('states the basis and factor set in a sentence', () => {
		expect(si.summary.short).toMatch(
			/Checked to .+, with the factor set EN 1990 expression 6\.10\./
		);
		expect(us.summary.long).toContain(`Checked to ${si.design.basis}`);
	});

	it('changes only the words: every number of the JSON stays in SI', () => {
		expect(us.summary.long).not.toBe(si.summary.long);
		const numbers = (r: typeof si) =>
			JSON.stringify(r, (k, v) => (typeof v === 'string' && k !== 'format' ? undefined : v));
		expect(numbers(us)).toBe(numbers(si));
		expect(us.units).toEqual(si.units);
	});
});
