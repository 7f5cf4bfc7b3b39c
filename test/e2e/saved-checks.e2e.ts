/**
 * Saved checks on the phone: saving with title and place, the list after a reload, search, edits
 * that keep revisions, duplicate, and delete with undo.
 */
import type { Page } from '@playwright/test';
import { fieldAt, openCheck, readLoadFactor, typeInto } from './check-helpers';
import { test, expect } from './fixtures';

async function saveDemo(page: Page, title: string, building = 'Block A'): Promise<void> {
	await openCheck(page);
	// After a save, a new check starts blank: bring the demo back.
	const demo = page.getByRole('button', { name: 'Open the demo' });
	if (await demo.isVisible()) await demo.click();
	await readLoadFactor(page);
	await page.getByTestId('open-save').click();
	await page.getByTestId('save-title').fill(title);
	await page.getByTestId('save-building').fill(building);
	await page.getByTestId('save-level').fill('B1');
	await page.getByTestId('save-grid').fill('C/4');
	await page.getByTestId('save-notes').fill('Pump change, hoist on trolley');
	await page.getByTestId('save-confirm').click();
	await expect(page.getByTestId('session-message')).toContainText('Saved');
	await expect(page).toHaveURL(/\/check\?id=/);
}

test('a saved check is listed after a reload and found by search', async ({ page }) => {
	await saveDemo(page, 'Plant room hoist beam');
	// The first save explains once what installing to the home screen does.
	await expect(page.getByTestId('install-note')).toContainText('home screen');
	await page.getByRole('button', { name: 'Got it' }).click();
	await expect(page.getByTestId('install-note')).toHaveCount(0);

	await page.goto('/');
	await page.reload();
	const items = page.getByTestId('saved-item');
	await expect(items).toHaveCount(1);
	await expect(items.first()).toContainText('Plant room hoist beam');
	await expect(items.first()).toContainText('Block A · B1 · C/4');

	await page.getByTestId('search').fill('block a');
	await expect(items).toHaveCount(1);
	await page.getByTestId('search').fill('warehouse');
	await expect(items).toHaveCount(0);
	await expect(page.getByTestId('empty-list')).toContainText('No saved check matches');
});

test('editing a saved check keeps the earlier version', async ({ page }) => {
	await saveDemo(page, 'Edit me');
	const before = await readLoadFactor(page);
	await typeInto(page, 'loads[2].value', '8');
	await expect.poll(() => readLoadFactor(page)).not.toBeCloseTo(before, 3);
	await page.getByTestId('open-save').click();
	await page.getByTestId('save-confirm').click();
	await expect(page.getByTestId('session-message')).toContainText('1 earlier version kept');

	await page.reload();
	await expect(fieldAt(page, 'loads[2].value')).toHaveValue('8');
	await expect(page.getByTestId('revisions').getByRole('listitem')).toHaveCount(1);
	// The earlier version opens with its own inputs.
	await page.getByTestId('revisions').getByRole('button', { name: 'Open as a new check' }).click();
	await expect(fieldAt(page, 'loads[2].value')).toHaveValue('12.625');

	await page.goto('/');
	await expect(page.getByTestId('saved-item').first()).toContainText('1 earlier version');
});

test('delete takes a check off the list and undo brings it back exactly', async ({ page }) => {
	await saveDemo(page, 'First beam', 'North wing');
	await saveDemo(page, 'Second beam', 'South wing');
	await page.goto('/');
	const items = page.getByTestId('saved-item');
	await expect(items).toHaveCount(2);
	// Newest first.
	await expect(page.getByTestId('saved-title')).toHaveText(['Second beam', 'First beam']);

	await items.filter({ hasText: 'First beam' }).getByTestId('delete').click();
	await expect(items).toHaveCount(1);
	await expect(page.getByTestId('undo-bar')).toContainText('Deleted “First beam”');
	await page.getByTestId('undo-delete').click();
	await expect(items).toHaveCount(2);
	await expect(page.getByTestId('saved-title')).toHaveText(['Second beam', 'First beam']);
	await expect(items.filter({ hasText: 'First beam' })).toContainText('North wing · B1 · C/4');

	await items.filter({ hasText: 'Second beam' }).getByRole('button', { name: /Duplicate/ }).click();
	await expect(items).toHaveCount(3);
	await expect(page.getByTestId('saved-title').filter({ hasText: 'Second beam (copy)' })).toHaveCount(1);
});
