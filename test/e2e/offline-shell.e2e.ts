/**
 * The installable offline app: first visit online, the service worker takes control, the network
 * goes away, and the app still loads, still computes, and still shows its own not-found page.
 */
import { openDemo, typeInto } from './check-helpers';
import { test, expect, waitForServiceWorkerControl } from './fixtures';

test('reloads offline from the service worker and still computes the demo check', async ({
	page,
	context
}) => {
	await openDemo(page);
	// An edit (the same hoist load) makes it the draft a reload brings back.
	await typeInto(page, 'loads[2].value', '12,625');
	await waitForServiceWorkerControl(page);
	// The worker precaches in its install step; wait until it is active and the cache is filled.
	await page.evaluate(async () => {
		await navigator.serviceWorker.ready;
	});
	const onlineFactor = await page.getByTestId('load-factor').first().textContent();
	expect(Number.parseFloat(onlineFactor ?? '')).toBeGreaterThan(0);

	await context.setOffline(true);
	const response = await page.reload();
	expect(response?.fromServiceWorker()).toBe(true);
	await expect(page.getByTestId('offline-badge')).toBeVisible();
	await expect(page.getByTestId('load-factor').first()).toHaveText(onlineFactor ?? '');
	await expect(page.getByTestId('engineer-notice').first()).toBeVisible();
});

test('an unknown path offline shows the app’s own not-found page', async ({ page, context }) => {
	await page.goto('/');
	await waitForServiceWorkerControl(page);
	await page.evaluate(async () => {
		await navigator.serviceWorker.ready;
	});
	await context.setOffline(true);
	const response = await page.goto('/no-such-place/at-all');
	expect(response?.fromServiceWorker()).toBe(true);
	await expect(page.getByTestId('not-found')).toContainText('Nothing at this address');
});

test.describe('first run', () => {
	test.use({ acknowledged: false });

	test('shows the engineer-of-record notice until acknowledged, then remembers it', async ({
		page
	}) => {
		await page.goto('/');
		const gate = page.getByRole('dialog', { name: 'Before you start' });
		await expect(gate).toBeVisible();
		await expect(gate).toContainText('engineer of record');
		await page.getByTestId('acknowledge-notice').click();
		await expect(gate).toBeHidden();
		await page.reload();
		await expect(page.getByRole('heading', { level: 1 }).first()).toBeVisible();
		await expect(page.getByRole('dialog', { name: 'Before you start' })).toHaveCount(0);
		// Reachable from every screen.
		for (const path of ['/', '/check', '/settings', '/about']) {
			await page.goto(path);
			await expect(page.getByTestId('notice-link')).toHaveAttribute('href', '/about#notice');
		}
	});
});
