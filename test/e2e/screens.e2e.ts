/**
 * The main screens at 360 px: screenshots for a person to look at (saved under test-results/),
 * and an accessibility scan of each with axe (WCAG 2.0/2.1/2.2 A and AA rules).
 */
import AxeBuilder from '@axe-core/playwright';
import { test, expect } from './fixtures';

test.use({ viewport: { width: 360, height: 780 } });

const AXE_TAGS = ['wcag2a', 'wcag2aa', 'wcag21aa', 'wcag22aa'];

test('the demo check: result, drawings and notice at 360 px, no axe violations', async ({ page }) => {
	await page.goto('/check');
	await expect(page.getByTestId('verdict')).toBeVisible();
	await expect(page.getByTestId('moment-diagram')).toBeVisible();
	await page.screenshot({ path: 'test-results/screens/check-360.png', fullPage: true });
	const scan = await new AxeBuilder({ page }).withTags(AXE_TAGS).analyze();
	expect(scan.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target).join(' ')}`)).toEqual([]);
});

test('saved checks, settings and about at 360 px, no axe violations', async ({ page }) => {
	for (const [path, name] of [
		['/', 'saved'],
		['/settings', 'settings'],
		['/about', 'about']
	] as const) {
		await page.goto(path);
		await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
		await page.screenshot({ path: `test-results/screens/${name}-360.png`, fullPage: true });
		const scan = await new AxeBuilder({ page }).withTags(AXE_TAGS).analyze();
		expect(scan.violations.map((v) => `${name} ${v.id}: ${v.nodes.map((n) => n.target).join(' ')}`)).toEqual([]);
	}
});
