/**
 * Shared Playwright fixtures for every browser test:
 * - `offsiteRequests`: every request that is not to the app's own origin is recorded, and the test
 *   fails at the end if there was any (the app must never talk to anything but itself);
 * - `acknowledged`: by default the engineer-of-record notice is marked as read before the page
 *   loads, so tests start on the screen they want (the first-run test turns this off).
 */
import { test as base, expect, type Page } from '@playwright/test';

export const NOTICE_KEY = 'hingepoint.notice-acknowledged.v1';

export const test = base.extend<{ acknowledged: boolean; offsiteRequests: string[] }>({
	acknowledged: [true, { option: true }],
	offsiteRequests: [
		async ({ page, baseURL }, use) => {
			const origin = new URL(baseURL ?? 'http://localhost:4173').origin;
			const offsite: string[] = [];
			page.context().on('request', (request) => {
				const url = request.url();
				if (url.startsWith('data:') || url.startsWith('blob:')) return;
				if (new URL(url).origin !== origin) offsite.push(url);
			});
			await use(offsite);
			expect(offsite, 'requests that left the device').toEqual([]);
		},
		{ auto: true }
	],
	page: async ({ page, acknowledged }, use) => {
		if (acknowledged) {
			await page.addInitScript((key) => {
				if (!localStorage.getItem(key)) localStorage.setItem(key, 'test');
			}, NOTICE_KEY);
		}
		await use(page);
	}
});

export { expect };

/** Waits until the service worker controls the page (only then can the page work offline). */
export async function waitForServiceWorkerControl(page: Page): Promise<void> {
	await page.waitForFunction(() => navigator.serviceWorker?.controller !== null, undefined, {
		timeout: 30_000
	});
}
