/**
 * On the AISC 360-22 bases no word of a report is Eurocode notation: no γM, no "EN 1993", no
 * "Class 1/2/3/4", no χLT, Mb,Rd or Vpl,Rd, no E = 210 000 MPa. Every string of the report is
 * scanned (the echoed case file aside), over both methods, both units, and cases that take each
 * route: plastic collapse, elastic with lateral-torsional buckling, a noncompact flange, hollow
 * and own-dimension sections, a known Mp and a slender flange (outside scope).
 * The AISC words expected instead (φbMn, Lb, compact/noncompact, AISC 360-22 clauses) are the
 * Specification's notation (AISC 360-22, from memory).
 */
import { describe, expect, it } from 'vitest';
import { checkCase, type CheckReport } from '../../src/lib/engine/index';

/** Eurocode notation and clause names that must not appear on an AISC basis. */
const EUROCODE_WORDS = /γM|EN 199|Class [1-4]|χLT|Mb,Rd|Vpl,Rd|My,V,Rd|MEd|VEd|FRd|FEd|210 000/;

function strings(value: unknown, out: string[] = []): string[] {
	if (typeof value === 'string') out.push(value);
	else if (Array.isArray(value)) value.forEach((v) => strings(v, out));
	else if (value && typeof value === 'object') Object.values(value).forEach((v) => strings(v, out));
	return out;
}

type Section = Record<string, unknown>;

/** A US-units case on one basis: 20 ft span, a dead load, a point load and a line load. */
function usCase(o: {
	basis: string;
	section: Section;
	lateral: unknown;
	supports?: string[];
	grade?: unknown;
}) {
	return {
		format: 'hingepoint.case',
		version: 1,
		title: 'DEMO — invented',
		basis: o.basis,
		units: 'us',
		beam: {
			spans: [20],
			supports: o.supports ?? ['pin', 'pin'],
			section: o.section,
			grade: o.grade ?? 'A992',
			restraint: { lateral: o.lateral },
			bearing: [4, 4]
		},
		loads: [
			{ kind: 'uniform', from: 0, to: 20, value: 0.3, action: 'permanent' },
			{ kind: 'uniform', from: 0, to: 12, value: 0.2, action: 'imposed' },
			{ kind: 'point', x: 8, value: 2, action: 'temporary' }
		]
	};
}

const SECTIONS: [string, Section][] = [
	['W16x40 (compact to λpd)', { designation: 'W16x40' }],
	['W8x31 (noncompact flange)', { designation: 'W8x31' }],
	['rolled I by its dimensions, in', { shape: 'I', h: 12.2, b: 6.49, tw: 0.23, tf: 0.38, r: 0.3 }],
	['rectangular tube', { shape: 'RHS', h: 8, b: 4, t: 0.375 }],
	['round tube', { shape: 'CHS', d: 6.625, t: 0.28 }],
	['a known Mp only', { mp: 150 }],
	[
		'welded I with a slender flange (outside scope)',
		{ shape: 'welded-I', h: 16, b: 14, tw: 0.375, tf: 0.25 }
	]
];
const LATERAL: unknown[] = ['continuous', 'ends-only', [10]];

const cases = ['aisc-lrfd', 'aisc-asd'].flatMap((basis) =>
	SECTIONS.flatMap(([name, section]) =>
		LATERAL.map((lateral) => ({ basis, name, section, lateral }))
	)
);

function reportOf(json: unknown, units: 'si' | 'us'): CheckReport {
	const out = checkCase(json, { units });
	if (!out.ok) throw new Error(out.issues.map((i) => `${i.path}: ${i.message}`).join('; '));
	return out.report;
}

describe('AISC report words', () => {
	it.each(cases)('$basis, $name, restraint $lateral: no Eurocode notation', (c) => {
		for (const units of ['si', 'us'] as const) {
			const r = reportOf(usCase(c), units);
			const { case: _echo, ...report } = r;
			const offenders = strings(report).filter((s) => EUROCODE_WORDS.test(s));
			expect(offenders).toEqual([]);
		}
	});

	it('says φbMn, Lb and compact on LRFD and Mn/Ωb on ASD (the scan has AISC words to see)', () => {
		const lrfd = reportOf(usCase({ ...cases[0], lateral: 'ends-only' }), 'us');
		expect(lrfd.summary.long).toMatch(/φbMn/);
		expect(lrfd.sections[0].classNote).toMatch(/compact/);
		expect(lrfd.checks.some((c) => typeof c.lb === 'number')).toBe(true);
		const asd = reportOf(usCase({ ...cases[0], basis: 'aisc-asd', lateral: 'ends-only' }), 'us');
		expect(asd.summary.long).toMatch(/Mn\/Ωb/);
	});

	it('the slender flange is outside scope with no numbers, on AISC words', () => {
		const slender = cases.find((c) => c.name.startsWith('welded I'))!;
		const r = reportOf(usCase(slender), 'us');
		expect(r.answer.verdict).toBe('outside-scope');
		expect(r.checks).toEqual([]);
		expect(r.answer.reasons.join(' ')).toMatch(/Table B4\.1b/);
	});

	it('the Eurocode basis still speaks Eurocode (the scan would see its words)', () => {
		const en = usCase({
			basis: 'eurocode',
			section: { designation: 'W16x40' },
			lateral: 'ends-only'
		});
		const r = reportOf({ ...en, beam: { ...en.beam, grade: 'S355' } }, 'si');
		expect(strings(r).some((s) => EUROCODE_WORDS.test(s))).toBe(true);
	});
});
