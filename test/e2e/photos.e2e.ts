/**
 * Photos on a check, on a 360 px phone: a new check asks to be saved first; a picture chosen from
 * the files is shrunk on the device, shown as a thumbnail, still there after a reload, and removed.
 */
import { makePng } from '../support/make-png';
import { openCheck, saveDemo } from './check-helpers';
import { test, expect } from './fixtures';

test.use({ viewport: { width: 360, height: 780 } });

test('a photo is shrunk, shown, kept over a reload, and removed', async ({ page }) => {
	await openCheck(page);
	await page.getByTestId('start-blank').click();
	await expect(page.getByTestId('photo-save-first')).toContainText('Save this check first');
	await expect(page.getByTestId('photo-files')).toBeDisabled();

	await saveDemo(page, 'Beam with photos');
	await expect(page.getByTestId('photo-save-first')).toHaveCount(0);
	await page
		.getByTestId('photo-files')
		.setInputFiles({ name: 'label.png', mimeType: 'image/png', buffer: makePng(2000, 1000) });
	const thumb = page.getByTestId('photo-thumb');
	await expect(thumb).toHaveCount(1);
	await expect(page.getByTestId('photo-message')).toContainText('1 photo kept on this phone');
	// Kept at 1600 px on its longest side, shape unchanged, and drawn from a local object URL.
	await expect(thumb).toHaveAttribute('width', '1600');
	await expect(thumb).toHaveAttribute('height', '800');
	await expect(thumb).toHaveAttribute('src', /^blob:/);
	await expect
		.poll(() => thumb.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth))
		.toBe(1600);
	const box = await thumb.boundingBox();
	expect(box!.x + box!.width).toBeLessThanOrEqual(360);

	await page.getByTestId('photo-caption').fill('Section label on the web');
	await page.getByTestId('photo-caption').blur();
	await expect(page.getByTestId('photo-message')).toHaveText('Caption saved.');

	await page.reload();
	await expect(page.getByTestId('check-heading')).toHaveAttribute('data-ready', 'true');
	await expect(thumb).toHaveCount(1);
	await expect(page.getByTestId('photo-caption')).toHaveValue('Section label on the web');
	await expect(thumb).toHaveAttribute('alt', 'Section label on the web');

	await page.getByTestId('photo-remove').click();
	await expect(thumb).toHaveCount(0);
	await expect(page.getByTestId('photo-message')).toHaveText('Photo removed.');
	await page.reload();
	await expect(page.getByTestId('check-heading')).toHaveAttribute('data-ready', 'true');
	await expect(page.getByTestId('photo-files')).toBeEnabled();
	await expect(thumb).toHaveCount(0);
});
