/**
 * Photos on a check, on a 360 px phone: a new check asks to be saved first; a picture chosen from
 * the files is shrunk on the device, shown as a thumbnail, still there after a reload, and removed.
 */
import { deflateSync } from 'node:zlib';
import { openCheck, saveDemo } from './check-helpers';
import { test, expect } from './fixtures';

test.use({ viewport: { width: 360, height: 780 } });

// CRC-32 as PNG chunks need it.
function crc32(bytes: Buffer): number {
	let crc = 0xffffffff;
	for (const byte of bytes) {
		crc ^= byte;
		for (let k = 0; k < 8; k++) crc = (crc >>> 1) ^ (0xedb88320 & -(crc & 1));
	}
	return (crc ^ 0xffffffff) >>> 0;
}

function chunk(type: string, data: Buffer): Buffer {
	const head = Buffer.alloc(4);
	head.writeUInt32BE(data.length);
	const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
	const tail = Buffer.alloc(4);
	tail.writeUInt32BE(crc32(body));
	return Buffer.concat([head, body, tail]);
}

/** A width × height RGB PNG with a colour ramp, made here so the test needs no image file. */
function makePng(width: number, height: number): Buffer {
	const header = Buffer.alloc(13);
	header.writeUInt32BE(width, 0);
	header.writeUInt32BE(height, 4);
	header.set([8, 2, 0, 0, 0], 8);
	const rows = Buffer.alloc((width * 3 + 1) * height);
	for (let y = 0; y < height; y++) {
		const row = y * (width * 3 + 1);
		for (let x = 0; x < width; x++)
			rows.set([(x * 255) / width, (y * 255) / height, 128], row + 1 + x * 3);
	}
	const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
	return Buffer.concat([
		signature,
		chunk('IHDR', header),
		chunk('IDAT', deflateSync(rows)),
		chunk('IEND', Buffer.alloc(0))
	]);
}

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
