/**
 * The calc sheet, built in node for invented beams and read back with a PDF text extractor: the
 * answer comes first, the allowable load is printed as the screen formats it, every check is
 * listed with its clause, the notice is there; outside scope no capacity figure is printed.
 */
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { makePng } from '../../support/make-png';
import { checkCase, type CaseFile, type CheckReport } from '../../../src/lib/engine';
import { ENGINEER_NOTICE_FULL } from '../../../src/lib/engine/notice';
import { buildCalcSheet } from '../../../src/lib/calc-sheet/build-calc-sheet';
import { PAPER_SIZE, type SheetContext } from '../../../src/lib/calc-sheet/sheet-context';
import { isSheetReport } from '../../../src/lib/calc-sheet/sheet-report';
import { toPdfText } from '../../../src/lib/calc-sheet/pdf-text';
import { formatQuantity } from '../../../src/lib/ui/format';

const demo: CaseFile = {
	format: 'hingepoint.case',
	version: 1,
	title: 'Demo: hoist beam in the old store (invented)',
	beam: {
		spans: [6],
		supports: ['pin', 'pin'],
		section: { designation: 'UB 305x165x40' },
		grade: 'S275',
		restraint: { lateral: 'continuous', loadHeight: 'top-flange' }
	},
	loads: [
		{ kind: 'uniform', from: 0, to: 6, value: 4, action: 'permanent' },
		{ kind: 'point', x: 2.5, value: 20, action: 'temporary', label: 'hoist' }
	]
};

const context: SheetContext = {
	title: 'Demo hoist beam',
	place: 'Invented yard, bay C',
	date: '2 Dec 2026',
	preparedBy: 'A. Tester, Example Ltd',
	record: { id: 'chk-demo', revision: '2' },
	appVersion: '0.1.0',
	units: 'SI',
	paper: 'a4'
};

function reportOf(c: CaseFile): CheckReport {
	const out = checkCase(c, { curve: true });
	if (!out.ok) throw new Error('the invented case is valid');
	return out.report;
}

const FONTS = fileURLToPath(
	new URL('../../../node_modules/pdfjs-dist/standard_fonts/', import.meta.url)
);

/** The page size and its text in content order (drawn top to bottom), one string. */
async function readPdf(
	bytes: Uint8Array
): Promise<{ text: string; size: number[]; pages: number }> {
	const pdf = await getDocument({
		data: bytes.slice(),
		isEvalSupported: false,
		standardFontDataUrl: FONTS
	}).promise;
	const page = await pdf.getPage(1);
	const content = await page.getTextContent();
	const text = content.items
		.map((item) => ('str' in item ? item.str : ''))
		.join(' ')
		.replace(/\s+/g, ' ');
	const size = [page.view[2], page.view[3]];
	await pdf.destroy();
	return { text, size, pages: pdf.numPages };
}

describe('buildCalcSheet', () => {
	it('prints the answer first, the allowable load as shown, every check and the notice', async () => {
		const report = reportOf(demo);
		expect(report.answer.verdict).toBe('pass');
		expect(isSheetReport(report)).toBe(true);
		const bytes = await buildCalcSheet(report, context);
		expect(new TextDecoder().decode(bytes.slice(0, 5))).toBe('%PDF-');
		const { text, size, pages } = await readPdf(bytes);
		expect(pages).toBe(1);
		expect(size[0]).toBeCloseTo(PAPER_SIZE.a4[0], 1);
		expect(size[1]).toBeCloseTo(PAPER_SIZE.a4[1], 1);

		const allowed = report.answer.allowable[0].value!;
		const printed = formatQuantity(allowed, 'force', 'SI').replace('\u00a0', ' ');
		expect(text).toContain(`Largest proposed load: ${printed} (load 2, hoist)`);
		// The printed number is the engine's answer to the precision shown (0.1 kN).
		expect(Math.abs(Number(printed.split(' ')[0]) - allowed)).toBeLessThanOrEqual(0.05);
		// The first number read on the page is the governing answer.
		const afterVerdict = text.slice(text.indexOf('PASS'));
		expect(text.indexOf('PASS')).toBeGreaterThan(0);
		expect(afterVerdict.match(/\d+(\.\d+)?/)?.[0]).toBe(printed.split(' ')[0]);
		expect(text.slice(0, text.indexOf('PASS'))).not.toMatch(/\d/);
		expect(text.indexOf('Reviewed by')).toBeGreaterThan(text.indexOf('Checks'));

		const governing = report.answer.governing!.label;
		expect(text).toContain(`Governing check: ${toPdfText(governing)}`);
		for (const c of report.checks) {
			expect(text).toContain(toPdfText(c.clause));
			expect(text).toContain(`${Math.round(c.utilisation * 100)} %`);
		}
		expect(text).toContain(toPdfText(ENGINEER_NOTICE_FULL[2]));
		expect(text).toContain('Reviewed by');
		expect(text).toContain('chk-demo, revision 2');
		expect(text).toContain('A. Tester, Example Ltd');
		expect(text).toContain(`engine ${report.engineVersion}`);
		expect(text).toContain('Governing capacity curve');
	});

	it('prints US customary units on Letter paper', async () => {
		const report = reportOf(demo);
		const bytes = await buildCalcSheet(report, { ...context, units: 'US', paper: 'letter' });
		const { text, size } = await readPdf(bytes);
		expect(size).toEqual([612, 792]);
		const printed = formatQuantity(report.answer.allowable[0].value!, 'force', 'US').replace(
			'\u00a0',
			' '
		);
		expect(printed).toMatch(/kip$/);
		expect(text).toContain(`Largest proposed load: ${printed} (load 2, hoist)`);
		expect(text).toContain('19.69 ft');
	});

	it('outside scope prints the reasons and no capacity figure', async () => {
		const unknown = { ...demo, beam: { ...demo.beam, grade: 'unknown-old' } };
		const report = reportOf(unknown);
		expect(report.answer.verdict).toBe('outside-scope');
		const { text } = await readPdf(await buildCalcSheet(report, context));
		expect(text).toContain('OUTSIDE SCOPE');
		for (const reason of report.answer.reasons)
			expect(text).toContain(toPdfText(reason).slice(0, 40));
		expect(text).not.toMatch(
			/Largest proposed load|Governing check|\d kNm|Governing capacity curve/
		);
		// The only forces printed are the loads as entered.
		const forces = [...text.matchAll(/(\d+(?:\.\d+)?) kN(?![\w/])/g)].map((m) => Number(m[1]));
		expect(forces).toEqual([20]);
	});

	it('stays on one page with many loads and notes', async () => {
		const many: CaseFile = {
			...demo,
			beam: { ...demo.beam, spans: [4, 5, 4], supports: ['pin', 'pin', 'pin', 'pin'] },
			loads: Array.from({ length: 14 }, (_, i) => ({
				kind: 'point' as const,
				x: 0.5 + i * 0.9,
				value: 5 + i,
				action: i % 3 === 0 ? ('temporary' as const) : ('imposed' as const),
				label: `load number ${i + 1} with a longer description`
			}))
		};
		// No curve here: it would add minutes of engine time and nothing to the layout question.
		const out = checkCase(many);
		if (!out.ok) throw new Error('the invented case is valid');
		const report = out.report;
		const { text, pages } = await readPdf(await buildCalcSheet(report, context));
		expect(pages).toBe(1);
		expect(text).toContain('Reviewed by');
		expect(text).toContain(toPdfText(ENGINEER_NOTICE_FULL[4]));
	});

	it('writes every figure of a US-units report in US units: no kN, kNm, mm or MPa', async () => {
		const out = checkCase(demo, { units: 'us' });
		if (!out.ok) throw new Error('the invented case is valid');
		const bytes = await buildCalcSheet(out.report, { ...context, units: 'US', paper: 'letter' });
		const { text } = await readPdf(bytes);
		// The notices and assumptions are printed (E is among them, 210 000 MPa in SI).
		expect(text).toContain('ksi');
		expect(text).not.toMatch(/kN|MPa|N\/mm|\bmm\b|\d m\b/);
	});
});

/** Text and the number of images drawn on each page. */
async function readPages(bytes: Uint8Array): Promise<{ text: string; images: number }[]> {
	const pdf = await getDocument({
		data: bytes.slice(),
		isEvalSupported: false,
		standardFontDataUrl: FONTS
	}).promise;
	const pages = [];
	for (let n = 1; n <= pdf.numPages; n++) {
		const page = await pdf.getPage(n);
		const content = await page.getTextContent();
		const text = content.items.map((item) => ('str' in item ? item.str : '')).join(' ');
		const ops = await page.getOperatorList();
		const images = ops.fnArray.filter((f) => f === OPS.paintImageXObject).length;
		pages.push({ text: text.replace(/\s+/g, ' '), images });
	}
	await pdf.destroy();
	return pages;
}

describe("buildCalcSheet with the check's photos", () => {
	const report = reportOf(demo);
	const photo = (caption: string, w = 40, h = 30) => ({
		bytes: new Uint8Array(makePng(w, h)),
		type: 'image/png',
		caption
	});

	it('keeps the sheet on page 1 and puts the photos on page 2, each with its caption', async () => {
		const photos = [photo('Section label on the web'), photo('Tape across the flange', 30, 60)];
		const pages = await readPages(await buildCalcSheet(report, context, photos));
		expect(pages).toHaveLength(2);
		expect(pages[0].images).toBe(0);
		expect(pages[0].text).toContain('Photos 2 on page 2');
		expect(pages[0].text).toContain('Reviewed by');
		expect(pages[1].images).toBe(2);
		expect(pages[1].text).toContain('Photo 1: Section label on the web');
		expect(pages[1].text).toContain('Photo 2: Tape across the flange');
		expect(pages[1].text).toContain('chk-demo, revision 2');
	});

	it('takes six photos a page, and names a photo it cannot print', async () => {
		const photos = Array.from({ length: 7 }, (_, i) => photo(`view ${i + 1}`));
		photos.push({
			bytes: new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 1, 2, 3]),
			type: 'image/jpeg',
			caption: 'broken'
		});
		const pages = await readPages(await buildCalcSheet(report, context, photos));
		expect(pages).toHaveLength(3);
		expect(pages[0].text).toContain('Photos 8 on pages 2-3');
		expect(pages.map((p) => p.images)).toEqual([0, 6, 1]);
		expect(pages[2].text).toContain('Photo 8: broken (this image type cannot be printed)');
	});

	it('is one page with no photos, as before', async () => {
		const pages = await readPages(await buildCalcSheet(report, context, []));
		expect(pages).toHaveLength(1);
		expect(pages[0].text).not.toContain('Photos');
	});
});
