/**
 * A new version of the app never reloads the page by itself: the "update ready" notice waits for
 * the person's tap, so a half-filled check is never lost to a silent update.
 */
import { appendFileSync, readFileSync, writeFileSync } from 'node:fs';
import { test, expect, waitForServiceWorkerControl } from './fixtures';

const WORKER = `${process.env.BUILD_DIR ?? 'build'}/sw.js`;

test('a waiting new version shows the update notice and reloads only on tap', async ({ page }) => {
	const original = readFileSync(WORKER);
	try {
		await page.goto('/about');
		await waitForServiceWorkerControl(page);
		// Mark this page instance: a reload would wipe the marker.
		await page.evaluate(() => ((window as unknown as { marker: string }).marker = 'still here'));

		// Publish a "new version": any byte change to the worker script makes the browser install it.
		appendFileSync(WORKER, `\n// test build ${Date.now()}\n`);
		await page.evaluate(async () => (await navigator.serviceWorker.getRegistration())?.update());

		const toast = page.getByRole('status').filter({ hasText: 'Update ready' });
		await expect(toast).toBeVisible({ timeout: 30_000 });
		await page.waitForTimeout(1500);
		expect(await page.evaluate(() => (window as unknown as { marker?: string }).marker)).toBe(
			'still here'
		);

		await Promise.all([
			page.waitForEvent('load'),
			toast.getByRole('button', { name: 'Reload now' }).click()
		]);
		expect(
			await page.evaluate(() => (window as unknown as { marker?: string }).marker)
		).toBeUndefined();
		// The reload came after the hand-over: the new version is in charge and nothing waits.
		const after = await page.evaluate(async () => {
			const registration = await navigator.serviceWorker.getRegistration();
			return {
				waiting: registration?.waiting ?? null,
				controlled: navigator.serviceWorker.controller !== null
			};
		});
		expect(after).toEqual({ waiting: null, controlled: true });
		await expect(toast).toBeHidden();
	} finally {
		writeFileSync(WORKER, original);
	}
});
