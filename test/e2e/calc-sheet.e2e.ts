/**
 * The calc sheet on a small phone: a tap builds the PDF on the device (the PDF library loads only
 * then) and, with no file sharing in headless Chromium, it arrives as a download.
 */
import { readFile } from 'node:fs/promises';
import { openCheck } from './check-helpers';
import { test, expect } from './fixtures';

test.use({ viewport: { width: 360, height: 740 }, hasTouch: true, isMobile: true });

test('the calc sheet button downloads a PDF of the check', async ({ page }) => {
	await openCheck(page);
	const demo = page.getByRole('button', { name: /demo/i });
	if (await demo.isVisible()) await demo.click();
	// The button is there once the demo check has its result.
	const button = page.getByTestId('calc-sheet');
	await expect(button).toBeVisible({ timeout: 20_000 });
	await button.scrollIntoViewIfNeeded();
	const box = await button.boundingBox();
	expect(box && box.x + box.width).toBeLessThanOrEqual(360);
	const [download] = await Promise.all([page.waitForEvent('download'), button.click()]);
	expect(download.suggestedFilename()).toMatch(/^calc-sheet.*\.pdf$/);
	const bytes = await readFile((await download.path())!);
	expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
	expect(bytes.length).toBeGreaterThan(2000);
	await expect(page.getByTestId('calc-sheet-status')).toHaveText('Calc sheet downloaded.');
});

test('the PDF library loads only on the tap, and the sheet goes to the share sheet as a PDF file where files can be shared', async ({
	page
}) => {
	test.setTimeout(120_000);
	// A share sheet that takes files, recording what it was given.
	await page.addInitScript(() => {
		const shared: { name: string; type: string; size: number }[] = [];
		(window as unknown as { sharedFiles: typeof shared }).sharedFiles = shared;
		navigator.canShare = (data?: ShareData) => Boolean(data?.files?.length);
		navigator.share = async (data?: ShareData) => {
			for (const f of data?.files ?? []) shared.push({ name: f.name, type: f.type, size: f.size });
		};
	});
	// Every script the page fetches, in order, with whether it holds the PDF library. The entry is
	// recorded when the response arrives; its body is read later, so a fast tap cannot outrun it.
	const scripts: Promise<boolean>[] = [];
	page.on('response', (response) => {
		if (!response.url().endsWith('.js')) return;
		scripts.push(
			response
				.text()
				.then((body) => body.includes('PDFDocument'))
				.catch(() => false)
		);
	});
	const holdsPdf = async (from: number) => (await Promise.all(scripts.slice(from))).some(Boolean);
	await openCheck(page);
	const demo = page.getByRole('button', { name: /demo/i });
	if (await demo.isVisible()) await demo.tap();
	const button = page.getByTestId('calc-sheet');
	await expect(button).toBeVisible({ timeout: 20_000 });
	await page.waitForLoadState('networkidle');
	const before = scripts.length;
	expect(before).toBeGreaterThan(0);
	expect(await holdsPdf(0)).toBe(false);

	await button.scrollIntoViewIfNeeded();
	await button.tap();
	await expect(page.getByTestId('calc-sheet-status')).toHaveText('Calc sheet shared.');
	await expect.poll(() => holdsPdf(before)).toBe(true);
	const shared = await page.evaluate(
		() =>
			(window as unknown as { sharedFiles: { name: string; type: string; size: number }[] })
				.sharedFiles
	);
	expect(shared).toHaveLength(1);
	expect(shared[0].name).toMatch(/^calc-sheet-.*\.pdf$/);
	expect(shared[0].type).toBe('application/pdf');
	expect(shared[0].size).toBeGreaterThan(2000);
});
