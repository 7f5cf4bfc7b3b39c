/**
 * The calc sheet on a small phone: a tap builds the PDF on the device (the PDF library loads only
 * then) and, with no file sharing in headless Chromium, it arrives as a download.
 */
import { readFile } from 'node:fs/promises';
import { openCheck } from './check-helpers';
import { test, expect } from './fixtures';

test.use({ viewport: { width: 360, height: 740 } });

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
