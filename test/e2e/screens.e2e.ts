/**
 * The main screens at 360 px (and the check on a tablet): screenshots for a person to look at,
 * saved under test-results/screens/, and an accessibility scan of each with axe (WCAG 2.0, 2.1
 * and 2.2, levels A and AA).
 */
import AxeBuilder from '@axe-core/playwright';
import type { Page } from '@playwright/test';
import { openCheck, openDemo, readLoadFactor, saveDemo } from './check-helpers';
import { test, expect } from './fixtures';

test.use({ viewport: { width: 360, height: 780 } });

const AXE_TAGS = ['wcag2a', 'wcag2aa', 'wcag21aa', 'wcag22aa'];

async function scan(page: Page, name: string): Promise<string[]> {
	const result = await new AxeBuilder({ page }).withTags(AXE_TAGS).analyze();
	return result.violations.map((v) => `${name} ${v.id}: ${v.nodes.map((n) => n.target).join(' ')}`);
}

test('the saved demo check: verdict, drawings and notice, no axe violations', async ({ page }) => {
	await saveDemo(page, 'Plant room beam (demo)');
	await expect(page.getByTestId('verdict')).toBeVisible();
	await expect(page.getByTestId('moment-diagram')).toBeVisible();
	await expect(page.getByTestId('engineer-notice')).toBeVisible();
	await page.screenshot({ path: 'test-results/screens/check-360.png', fullPage: true });
	expect(await scan(page, 'check')).toEqual([]);

	await page.goto('/');
	await expect(page.getByTestId('saved-item')).toHaveCount(1);
	await page.screenshot({ path: 'test-results/screens/saved-360.png', fullPage: true });
	expect(await scan(page, 'saved')).toEqual([]);
});

test('input problems on the form, settings and about: no axe violations', async ({ page }) => {
	await openCheck(page);
	await expect(page.getByTestId('result-issues')).toBeVisible();
	await page.screenshot({ path: 'test-results/screens/check-blank-360.png', fullPage: true });
	expect(await scan(page, 'blank check')).toEqual([]);
	for (const [path, name] of [
		['/settings', 'settings'],
		['/about', 'about']
	] as const) {
		await page.goto(path);
		await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
		await page.screenshot({ path: `test-results/screens/${name}-360.png`, fullPage: true });
		expect(await scan(page, name)).toEqual([]);
	}
});

test.describe('on a tablet', () => {
	test.use({ viewport: { width: 820, height: 1180 } });

	test('the check uses the width and stays clean for axe', async ({ page }) => {
		await openDemo(page);
		await readLoadFactor(page);
		await page.screenshot({ path: 'test-results/screens/check-tablet.png', fullPage: true });
		expect(await scan(page, 'tablet check')).toEqual([]);
	});
});

for (const theme of ['dark', 'contrast'] as const) {
	test(`the check in the ${theme} theme passes the contrast rules`, async ({ page }) => {
		await page.goto('/settings');
		await page.getByTestId(`theme-${theme}`).check();
		await expect(page.locator('html')).toHaveAttribute('data-theme', theme);
		await openDemo(page);
		await readLoadFactor(page);
		await page.screenshot({ path: `test-results/screens/check-${theme}-360.png`, fullPage: true });
		expect(await scan(page, `${theme} check`)).toEqual([]);
	});
}
