/**
 * Every file the build ships must be in the service worker's precache list, or the first offline
 * launch can miss it. Only the worker itself (and its workbox runtime) are served outside it.
 */
import { test, expect } from '@playwright/test';
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';

const BUILD = process.env.BUILD_DIR ?? 'build';

function listFiles(dir: string): string[] {
	return readdirSync(dir).flatMap((name) => {
		const path = join(dir, name);
		return statSync(path).isDirectory() ? listFiles(path) : [relative(BUILD, path)];
	});
}

/** Precache URLs as the worker requests them; a prerendered page `about.html` is listed as `about`. */
function precachedFiles(): Set<string> {
	const worker = readFileSync(join(BUILD, 'sw.js'), 'utf8');
	const urls = [...worker.matchAll(/url:"([^"]+)"/g)].map((m) => m[1]);
	const files = urls.map((url) => {
		if (url === '/') return 'index.html';
		return /\.[a-z0-9]+$/i.test(url) ? url : `${url}.html`;
	});
	return new Set(files);
}

test('every built file is precached by the service worker', () => {
	const precached = precachedFiles();
	const outsideWorker = (file: string) => file === 'sw.js' || /^workbox-[\w-]+\.js$/.test(file);
	const shipped = listFiles(BUILD).filter((file) => !outsideWorker(file));
	expect(shipped.length).toBeGreaterThan(10);
	const missing = shipped.filter((file) => !precached.has(file));
	expect(missing, 'files the offline app could not load').toEqual([]);
	expect(precached.has('200.html'), 'the not-found/app shell').toBe(true);
});

test('the manifest names the app and its icons', () => {
	const manifest = JSON.parse(readFileSync(join(BUILD, 'manifest.webmanifest'), 'utf8'));
	expect(manifest).toMatchObject({
		short_name: 'Hingepoint',
		id: '/',
		start_url: '/',
		scope: '/',
		display: 'standalone'
	});
	const sizes = manifest.icons.map(
		(icon: { sizes: string; purpose: string }) => `${icon.sizes} ${icon.purpose}`
	);
	expect(sizes).toEqual(expect.arrayContaining(['192x192 any', '512x512 any', '512x512 maskable']));
	for (const icon of manifest.icons) {
		const png = readFileSync(join(BUILD, icon.src));
		// PNG width and height sit at bytes 16–23 of the IHDR chunk.
		const [w, h] = [png.readUInt32BE(16), png.readUInt32BE(20)];
		expect(`${w}x${h}`).toBe(icon.sizes);
	}
});
