/**
 * The record on site (360 px, touch): a result already on screen follows a change of units made
 * in the settings, every word of the US report is in US customary units, an edit of a saved check
 * says at once, beside Save, that it is not saved, and the calc sheet can carry the check's
 * photos on a page after the sheet. Conversion: kip = 4.4482216152605 kN (NIST SP 811,
 * Appendix B).
 */
import { readFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import AxeBuilder from '@axe-core/playwright';
import type { Page } from '@playwright/test';
import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { makePng } from '../support/make-png';
import { fieldAt, readLoadFactor, saveDemo, typeInto } from './check-helpers';
import { test, expect } from './fixtures';

test.use({ viewport: { width: 360, height: 780 }, hasTouch: true, isMobile: true });

const KIP = 4.4482216152605;
const AXE_TAGS = ['wcag2a', 'wcag2aa', 'wcag21aa', 'wcag22aa'];
/** An SI figure or symbol in a text (the title aside). */
const SI_WORDS = /kN|MPa|N\/mm|\bmm\b|\d m\b/;

/** Main navigation link, tapped as a user would. */
async function tapNav(page: Page, name: string): Promise<void> {
	await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name }).tap();
}

async function downloadText(page: Page, testId: string): Promise<string> {
	const button = page.getByTestId(testId);
	await button.scrollIntoViewIfNeeded();
	const [download] = await Promise.all([page.waitForEvent('download'), button.tap()]);
	return readFile((await download.path())!, 'utf8');
}

const FONTS = fileURLToPath(
	new URL('../../node_modules/pdfjs-dist/standard_fonts/', import.meta.url)
);

/** Text and number of images drawn, page by page. */
async function readPdfPages(bytes: Uint8Array): Promise<{ text: string; images: number }[]> {
	const pdf = await getDocument({ data: bytes, isEvalSupported: false, standardFontDataUrl: FONTS })
		.promise;
	const pages = [];
	for (let n = 1; n <= pdf.numPages; n++) {
		const page = await pdf.getPage(n);
		const content = await page.getTextContent();
		const text = content.items.map((item) => ('str' in item ? item.str : '')).join(' ');
		const ops = await page.getOperatorList();
		pages.push({
			text: text.replace(/\s+/g, ' '),
			images: ops.fnArray.filter((f) => f === OPS.paintImageXObject).length
		});
	}
	await pdf.destroy();
	return pages;
}

test('a result on screen follows a units change in the settings, words and shared report included', async ({
	page
}) => {
	test.setTimeout(150_000);
	await saveDemo(page, 'Units beam');
	const address = page.url();
	const allowed = page.getByTestId('allowed-load').first();
	await expect(allowed).toHaveText(/kN$/);
	const kN = Number.parseFloat((await allowed.textContent()) ?? '');
	const siReport = await downloadText(page, 'download-long');
	expect(siReport).toContain('Units: SI');
	expect(siReport).toMatch(/E = 210 000 MPa/);

	// Settings through the menu, then back to the same check without reloading the page.
	await tapNav(page, 'Settings');
	await page.getByTestId('units-US').check();
	await expect(page.getByTestId('settings-status')).toHaveText('Saved.');
	await page.goBack();
	await expect(page.getByTestId('check-heading')).toHaveAttribute('data-ready', 'true');
	// Back returns to the saved check itself (it once opened a blank check).
	expect(page.url()).toBe(address);
	await expect(page.getByTestId('case-title')).toHaveValue('Units beam');
	await expect(allowed).toHaveText(/kip$/, { timeout: 20_000 });
	expect(Number.parseFloat((await allowed.textContent()) ?? '')).toBeCloseTo(kN / KIP, 1);
	await expect(page.getByTestId('bar-allowed')).toContainText('kip');

	// Every word of the result panel and of the full report is in US units now.
	const result = page.locator('#result');
	await result.getByText('Assumptions this result rests on').tap();
	await expect(result).toContainText('ksi');
	expect(await result.innerText()).not.toMatch(SI_WORDS);
	const usReport = await downloadText(page, 'download-long');
	expect(usReport).toContain('Units: US customary');
	const body = usReport.split('\n').slice(1).join('\n');
	expect(body).not.toMatch(SI_WORDS);
	// In plain sentences: the restraint and load height, the basis and factor set, the answer.
	expect(body).toMatch(/Restraint: compression flange .+; load (applied at|hung from) the/);
	expect(body).toMatch(/Checked to .+, with the factor set .+\./);
	const said = /Largest proposed load: ([\d.]+) kip \(load 3/.exec(body);
	expect(said).not.toBeNull();
	// Three significant figures in the text, two decimals on screen: the same force.
	expect(Number(said![1])).toBeCloseTo(kN / KIP, 1);
	expect(body).toContain(`E = ${Number((210_000 / ((KIP * 1000) / 645.16)).toPrecision(3))} ksi`);
});

test('an edit of a saved check says at once, beside Save and politely, that it is not saved', async ({
	page
}) => {
	test.setTimeout(120_000);
	await saveDemo(page, 'Edited beam');
	const note = page.getByTestId('unsaved-note');
	await expect(note).toHaveCount(0);
	await typeInto(page, 'beam.spans[0]', '5,2');
	// No leaving and coming back: the note is there while typing is still going on.
	await expect(note).toContainText('not saved yet');
	await expect(page.locator('#unsaved-note')).toHaveAttribute('aria-live', 'polite');
	await expect(page.locator('#unsaved-note')).toHaveAttribute('role', 'status');
	const save = page.getByTestId('open-save');
	await save.scrollIntoViewIfNeeded();
	await expect(note).toBeInViewport();
	const [noteBox, saveBox] = [await note.boundingBox(), await save.boundingBox()];
	expect(saveBox!.y - (noteBox!.y + noteBox!.height)).toBeLessThan(48);
	expect(saveBox!.y).toBeGreaterThan(noteBox!.y);

	// Typing the saved value back is no edit any more.
	await typeInto(page, 'beam.spans[0]', '4.8');
	await expect(note).toHaveCount(0);
	await typeInto(page, 'beam.spans[0]', '5,2');
	await expect(note).toBeVisible();
	await readLoadFactor(page);
	await save.tap();
	await page.getByTestId('save-confirm').tap();
	await expect(page.getByTestId('save-status')).toHaveText('Saved. 1 earlier version kept.');
	await expect(note).toHaveCount(0);

	// Taking an edit back restores the saved span and the note goes.
	await typeInto(page, 'beam.spans[0]', '6');
	await expect(note).toBeVisible();
	await page.getByTestId('show-saved').tap();
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue('5.2');
	await expect(note).toHaveCount(0);
});

test('the calc sheet carries the check photo on a second page when asked', async ({ page }) => {
	test.setTimeout(150_000);
	await saveDemo(page, 'Beam with a photo');
	await page
		.getByTestId('photo-files')
		.setInputFiles({ name: 'tape.png', mimeType: 'image/png', buffer: makePng(1200, 900) });
	await expect(page.getByTestId('photo-thumb')).toHaveCount(1);
	await page.getByTestId('photo-caption').fill('Tape on the bottom flange');
	await page.getByTestId('photo-caption').blur();
	await expect(page.getByTestId('photo-message')).toHaveText('Caption saved.');

	const option = page.getByTestId('calc-sheet-photos');
	await option.scrollIntoViewIfNeeded();
	await expect(option).not.toBeChecked();
	const box = await option.locator('xpath=..').boundingBox();
	expect(box!.height).toBeGreaterThanOrEqual(48);
	expect(box!.x + box!.width).toBeLessThanOrEqual(360);

	// Without the option: the one-page sheet alone.
	const button = page.getByTestId('calc-sheet');
	const [plain] = await Promise.all([page.waitForEvent('download'), button.tap()]);
	const onePage = await readPdfPages(new Uint8Array(await readFile((await plain.path())!)));
	expect(onePage).toHaveLength(1);

	await option.tap();
	await expect(option).toBeChecked();
	const [withPhoto] = await Promise.all([page.waitForEvent('download'), button.tap()]);
	await expect(page.getByTestId('calc-sheet-status')).toHaveText('Calc sheet downloaded.');
	const pages = await readPdfPages(new Uint8Array(await readFile((await withPhoto.path())!)));
	expect(pages).toHaveLength(2);
	expect(pages[0].images).toBe(0);
	expect(pages[0].text).toContain('Photos 1 on page 2');
	expect(pages[1].images).toBe(1);
	expect(pages[1].text).toContain('Photo 1: Tape on the bottom flange');
	expect(pages[1].text).toContain('Beam with a photo');

	await page.screenshot({ path: 'test-results/screens/calc-sheet-photos-360.png', fullPage: true });
	const result = await new AxeBuilder({ page }).withTags(AXE_TAGS).analyze();
	expect(
		result.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target).join(' ')}`)
	).toEqual([]);
});

test('the check screen in US units with unsaved edits: no axe violations', async ({ page }) => {
	test.setTimeout(150_000);
	await saveDemo(page, 'Axe beam');
	await tapNav(page, 'Settings');
	await page.getByTestId('units-US').check();
	await expect(page.getByTestId('settings-status')).toHaveText('Saved.');
	await page.goBack();
	await expect(page.getByTestId('allowed-load').first()).toHaveText(/kip$/, { timeout: 20_000 });
	await typeInto(page, 'beam.spans[0]', '17');
	await expect(page.getByTestId('unsaved-note')).toBeVisible();
	await readLoadFactor(page);
	const result = await new AxeBuilder({ page }).withTags(AXE_TAGS).analyze();
	expect(
		result.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target).join(' ')}`)
	).toEqual([]);
});
