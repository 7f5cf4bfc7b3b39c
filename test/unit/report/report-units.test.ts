/**
 * A report read in US customary units carries no SI figure in any of its words: notices,
 * assumptions, route reasons, check notes, names, messages and both share texts. Its numbers
 * stay SI, and the SI report's words are left as they were.
 *
 * Conversion factors: NIST SP 811 (2008), Appendix B — 1 in = 25.4 mm and 1 ft = 0.3048 m
 * exactly; 1 lbf = 4.448 222 N (0.453 592 37 kg × 9.806 65 m/s²), so 1 kip = 4.448 222 kN and
 * 1 ksi = 6.894 757 MPa. Rounding to 3 significant figures is our own display rule.
 */
import { describe, expect, it } from 'vitest';
import { checkCase, type CheckReport } from '../../../src/lib/engine';
import { restateSectionName, restateUnits } from '../../../src/lib/engine/report/restate-units';
import { WORD_CASES } from './word-cases';

const IN_MM = 25.4;
const FT_M = 0.3048;
// 1 kip = 1000 lbf = 1000 × 0.453 592 37 kg × 9.806 65 m/s² = 4448.2 N.
const KIP_KN = 0.45359237 * 9.80665;
const KSI_MPA = (KIP_KN * 1000) / (IN_MM * IN_MM);
const sig3 = (v: number) => Number(v.toPrecision(3)).toString();

/** Any SI symbol after a figure, or one standing alone (kN, kNm, MPa, N/mm², mm). */
const SI_FIGURE = /\d\s?(kN·m|kNm|kN\/m|kN|N\/mm²|MPa|mm|m)(?![\p{L}\d²³])/u;
const SI_SYMBOL = /kN|MPa|N\/mm|\bmm\b/;

/** Every string of a report, with its path, but for the echoed case and the user's title. */
function collectWords(
	v: unknown,
	path = 'report',
	out: [string, string][] = []
): [string, string][] {
	if (typeof v === 'string') out.push([path, v]);
	else if (Array.isArray(v)) v.forEach((x, i) => collectWords(x, `${path}[${i}]`, out));
	else if (v && typeof v === 'object') {
		for (const [k, x] of Object.entries(v)) {
			// The case echo keeps the file's units, `units` names the numbers' units, a grade's
			// source is a citation and the title is the user's own text.
			if (['case', 'units', 'source', 'title'].includes(k)) continue;
			collectWords(x, `${path}.${k}`, out);
		}
	}
	return out;
}

function run(c: unknown, units: 'si' | 'us') {
	const out = checkCase(c, { units, curve: true });
	if (!out.ok) throw new Error(`the case is valid: ${out.issues.map((i) => i.message).join(' ')}`);
	return out;
}

describe('restateUnits: figures in engine sentences, converted (NIST SP 811)', () => {
	it('converts each SI figure to the US customary unit of its quantity', () => {
		expect(restateUnits('stiff bearing 100 mm.', 'us')).toBe(
			`stiff bearing ${sig3(100 / IN_MM)} in.`
		);
		expect(restateUnits('the hinge at 2.40 m', 'us')).toBe(`the hinge at ${sig3(2.4 / FT_M)} ft`);
		expect(restateUnits('fy = 235 N/mm² is', 'us')).toBe(`fy = ${sig3(235 / KSI_MPA)} ksi is`);
		expect(restateUnits('fy 355 MPa', 'us')).toBe(`fy ${sig3(355 / KSI_MPA)} ksi`);
		expect(restateUnits('Mp 300 kNm (given)', 'us')).toBe(
			`Mp ${sig3(300 / (KIP_KN * FT_M))} kip·ft (given)`
		);
		expect(restateUnits('Mp 3 kN·m', 'us')).toBe(`Mp ${sig3(3 / (KIP_KN * FT_M))} kip·ft`);
		expect(restateUnits('2 kN/m and 66.5 kN', 'us')).toBe(
			`${sig3(2 / (KIP_KN / FT_M))} kip/ft and ${sig3(66.5 / KIP_KN)} kip`
		);
		expect(restateUnits('a pull of −5 kN', 'us')).toBe(`a pull of −${sig3(5 / KIP_KN)} kip`);
	});

	it('converts both ends of a range that shares one symbol', () => {
		expect(restateUnits('from 1.20 to 3.40 m next', 'us')).toBe(
			`from ${sig3(1.2 / FT_M)} to ${sig3(3.4 / FT_M)} ft next`
		);
		expect(restateUnits('210 / 380 MPa', 'us')).toBe(
			`${sig3(210 / KSI_MPA)} / ${sig3(380 / KSI_MPA)} ksi`
		);
	});

	it('leaves names, counts and areas alone', () => {
		for (const text of ['S355 plate', 'UB 305x165x40', 'Class 1 members', 'span 1 m²', 'load 2']) {
			expect(restateUnits(text, 'us')).toBe(text);
		}
	});

	it('writes a measured section in inches', () => {
		expect(restateSectionName('I 406.4x177.9x7.9x12.8 (measured)', 'us')).toBe(
			`I ${[406.4, 177.9, 7.9, 12.8].map((v) => sig3(v / IN_MM)).join('x')} in (measured)`
		);
	});

	it('reads figures grouped in thousands whole', () => {
		expect(restateUnits('E = 210 000 MPa', 'us')).toBe(`E = ${sig3(210_000 / KSI_MPA)} ksi`);
	});

	it('writes the US figures of a US basis in SI for an SI reader; inches stay as written', () => {
		expect(restateUnits('Fy above 65 ksi', 'si')).toBe(`Fy above ${sig3(65 * KSI_MPA)} MPa`);
		expect(restateUnits('E = 29 000 ksi', 'si')).toBe(`E = ${sig3(29_000 * KSI_MPA)} MPa`);
		expect(restateUnits('Mp 40 kip-ft, 3 kips and 0.5 kip/ft over 12 ft', 'si')).toBe(
			`Mp ${sig3(40 * KIP_KN * FT_M)} kNm, ${sig3(3 * KIP_KN)} kN and ` +
				`${sig3((0.5 * KIP_KN) / FT_M)} kN/m over ${sig3(12 * FT_M)} m`
		);
		expect(restateUnits('a bearing of 4 in', 'si')).toBe('a bearing of 4 in');
		// US text read in US units is left exactly as written.
		expect(restateUnits('E = 29 000 ksi', 'us')).toBe('E = 29 000 ksi');
	});

	it('leaves SI text exactly as written', () => {
		const text = 'stiff bearing 100 mm; fy = 235 N/mm²; hinge at 2.40 m; Mp 300 kNm';
		expect(restateUnits(text, 'si')).toBe(text);
		expect(restateSectionName('I 300x150x7.1x10.7 (measured)', 'si')).toBe(
			'I 300x150x7.1x10.7 (measured)'
		);
	});
});

describe('a report read in US customary units', () => {
	const cases = Object.entries(WORD_CASES).map(([name, c]) => ({
		name,
		si: run(c, 'si'),
		us: run(c, 'us')
	}));

	it('reaches sentences with figures in every kind of place (so the next test means something)', () => {
		const siWords = cases.flatMap(({ si }) => [
			...collectWords(si.report),
			...collectWords(si.warnings, 'warnings')
		]);
		const withFigures = siWords.filter(
			([path, w]) => !path.includes('summary') && SI_FIGURE.test(w)
		);
		const places = new Set(withFigures.map(([path]) => path.replace(/\[\d+\]/g, '[]')));
		for (const place of [
			'report.answer.message',
			'report.checks[].note',
			'report.design.route.reasons[]',
			'report.assumptions[]',
			'report.sections[].designation',
			'report.grades[].name',
			'warnings[].message'
		]) {
			expect(places, place).toContain(place);
		}
	});

	for (const { name, us } of cases) {
		it(`has no kN, kNm, mm, MPa or metre figure in any text: ${name}`, () => {
			const words = [...collectWords(us.report), ...collectWords(us.warnings, 'warnings')];
			expect(words.length).toBeGreaterThan(20);
			for (const [path, w] of words) {
				// The allowable load's `unit` field names the unit of its SI number.
				if (path.endsWith('.unit')) continue;
				expect(w, path).not.toMatch(SI_FIGURE);
				expect(w, path).not.toMatch(SI_SYMBOL);
			}
			expect(us.report.textUnits).toBe('us');
		});
	}

	it('an AISC-basis report read in SI carries its US figures in SI (inches aside)', () => {
		const aisc = {
			format: 'hingepoint.case',
			version: 1,
			title: 'AISC basis',
			basis: 'aisc-lrfd',
			beam: {
				spans: [6],
				supports: ['pin', 'pin'],
				section: { designation: 'W12x26' },
				grade: 'A992',
				restraint: { lateral: 'continuous' }
			},
			loads: [{ kind: 'point', x: 3, value: 20, action: 'temporary' }]
		};
		const si = run(aisc, 'si');
		const words = [...collectWords(si.report), ...collectWords(si.warnings, 'warnings')];
		// The Specification's own limit, Fy ≤ 65 ksi (AISC 360-22 Appendix 1), reads in MPa.
		expect(si.report.design.route.reasons.join(' ')).toContain(`Fy ≤ ${sig3(65 * KSI_MPA)} MPa`);
		for (const [path, w] of words) {
			expect(w, path).not.toMatch(/ksi|kips?\b|kip[·/-]ft|\d ?ft\b/);
		}
	});

	it('keeps every number in SI and the same as the SI report', () => {
		for (const { si, us } of cases) {
			expect(us.report.answer.multiplier).toBe(si.report.answer.multiplier);
			expect(us.report.answer.allowable).toEqual(si.report.answer.allowable);
			expect(us.report.checks.map((c) => c.utilisation)).toEqual(
				si.report.checks.map((c) => c.utilisation)
			);
			expect(us.report.units).toEqual(si.report.units);
			expect(si.report.textUnits).toBe('si');
		}
	});

	it('says the same things in both: sentence for sentence, figures converted', () => {
		const byName = Object.fromEntries(cases.map((c) => [c.name, c]));
		const list = (r: CheckReport) => [...r.notices, ...r.assumptions, ...r.design.route.reasons];
		for (const { si, us } of cases) {
			expect(list(us.report).length).toBe(list(si.report).length);
			expect(us.report.checks.map((c) => c.id)).toEqual(si.report.checks.map((c) => c.id));
		}
		// Hand-converted sentences (EN wording as the checks write it; figures by NIST SP 811).
		const loss = byName['two spans, section loss, patterned imposed load'];
		expect(loss.si.report.assumptions).toContain(
			'A section loss of 0.5 mm per exposed face is deducted.'
		);
		expect(loss.us.report.assumptions).toContain(
			`A section loss of ${sig3(0.5 / IN_MM)} in per exposed face is deducted.`
		);
		expect(loss.si.report.assumptions.join(' ')).toContain('E = 210 000 MPa');
		expect(loss.us.report.assumptions.join(' ')).toContain(`E = ${sig3(210_000 / KSI_MPA)} ksi`);
		expect(loss.us.report.sections[0].designation).toBe(
			`I ${[406.4, 177.9, 7.9, 12.8].map((v) => sig3(v / IN_MM)).join('x')} in (measured)`
		);
		const hinge = byName['propped, restrained away from the hinge under the load'];
		expect(hinge.si.report.design.route.reasons.join(' ')).toContain('the hinge at 3.00 m');
		expect(hinge.us.report.design.route.reasons.join(' ')).toContain(
			`the hinge at ${sig3(3 / FT_M)} ft`
		);
		const mp = byName['given Mp, restrained throughout'];
		expect(mp.si.report.sections[0].designation).toBe('Mp 100 kNm (given)');
		expect(mp.us.report.sections[0].designation).toBe(
			`Mp ${sig3(100 / (KIP_KN * FT_M))} kip·ft (given)`
		);
		const allowed = mp.si.report.answer.allowable[0].value!;
		expect(mp.si.report.answer.message).toContain(`Largest proposed load: ${sig3(allowed)} kN`);
		expect(mp.us.report.answer.message).toContain(
			`Largest proposed load: ${sig3(allowed / KIP_KN)} kip`
		);
		const old = byName['unknown old steel, restraint at two points, hoist under the bottom flange'];
		expect(old.si.warnings[0].message).toContain('fy = 210 N/mm²');
		expect(old.us.warnings[0].message).toContain(`fy = ${sig3(210 / KSI_MPA)} ksi`);
		expect(old.us.report.summary.long).toContain(
			`at the supports and at ${Number((2.5 / FT_M).toPrecision(4))} ft, ${Number((4 / FT_M).toPrecision(4))} ft`
		);
	});
});
