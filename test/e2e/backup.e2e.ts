/**
 * Backup on the phone: every saved check exported as one JSON file and imported back on a fresh
 * device gives exactly the same records; a damaged or foreign file is refused and nothing changes.
 */
import { readFile } from 'node:fs/promises';
import type { Page } from '@playwright/test';
import { saveDemo } from './check-helpers';
import { NOTICE_KEY, test, expect } from './fixtures';

async function exportFile(page: Page): Promise<string> {
	await page.goto('/');
	const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('export-backup').click()]);
	expect(download.suggestedFilename()).toMatch(/^hingepoint-backup-\d{4}-\d{2}-\d{2}\.json$/);
	return readFile((await download.path())!, 'utf8');
}

async function importText(page: Page, text: string, name = 'backup.json'): Promise<void> {
	await page.getByTestId('import-backup').setInputFiles({ name, mimeType: 'application/json', buffer: Buffer.from(text) });
}

test('export then import on a fresh device gives the same records exactly', async ({ page, browser, baseURL }) => {
	await saveDemo(page, 'Export one', 'East block');
	await saveDemo(page, 'Export two', 'West block');
	const first = await exportFile(page);
	const exported = JSON.parse(first);
	expect(exported.format).toBe('hingepoint.backup');
	expect(exported.records.map((r: { title: string }) => r.title).sort()).toEqual(['Export one', 'Export two']);

	// A second phone: its own, empty database.
	const other = await browser.newContext({ baseURL, viewport: { width: 360, height: 780 } });
	const fresh = await other.newPage();
	await fresh.addInitScript((key) => localStorage.setItem(key, 'test'), NOTICE_KEY);
	await fresh.goto('/');
	await expect(fresh.getByTestId('empty-list')).toBeVisible();
	await importText(fresh, first);
	await expect(fresh.getByTestId('list-message')).toHaveText('Backup read: 2 added, 0 updated, 0 already here.');
	await expect(fresh.getByTestId('saved-item')).toHaveCount(2);
	const again = JSON.parse(await exportFile(fresh));
	expect(again.records).toEqual(exported.records);

	// The same file twice adds nothing.
	await importText(fresh, first);
	await expect(fresh.getByTestId('list-message')).toHaveText('Backup read: 0 added, 0 updated, 2 already here.');
	await expect(fresh.getByTestId('saved-item')).toHaveCount(2);
	await other.close();
});

test('a damaged or foreign backup is refused and nothing changes', async ({ page }) => {
	await saveDemo(page, 'Keep me');
	const before = JSON.parse(await exportFile(page)).records;
	const good = JSON.stringify({ ...JSON.parse(await exportFile(page)) });

	await importText(page, good.slice(0, Math.floor(good.length / 2)));
	await expect(page.getByTestId('list-message')).toContainText('Backup refused, nothing changed');
	await importText(page, JSON.stringify({ format: 'someone-else', records: [] }));
	await expect(page.getByTestId('list-message')).toContainText('Backup refused, nothing changed');
	await expect(page.getByTestId('saved-item')).toHaveCount(1);
	expect(JSON.parse(await exportFile(page)).records).toEqual(before);
});
