/**
 * Backup on the phone: every saved check exported as one JSON file and imported back on a fresh
 * device gives the same records; an import only adds (a file cannot replace, hide or vouch for a
 * check); a damaged or foreign file is refused and nothing changes.
 */
import { readFile } from 'node:fs/promises';
import AxeBuilder from '@axe-core/playwright';
import type { Page } from '@playwright/test';
import { saveDemo } from './check-helpers';
import { NOTICE_KEY, test, expect } from './fixtures';

async function exportFile(page: Page): Promise<string> {
	await page.goto('/');
	const [download] = await Promise.all([
		page.waitForEvent('download'),
		page.getByTestId('export-backup').click()
	]);
	expect(download.suggestedFilename()).toMatch(/^hingepoint-backup-\d{4}-\d{2}-\d{2}\.json$/);
	return readFile((await download.path())!, 'utf8');
}

async function importText(page: Page, text: string, name = 'backup.json'): Promise<void> {
	await page
		.getByTestId('import-backup')
		.setInputFiles({ name, mimeType: 'application/json', buffer: Buffer.from(text) });
}

test('export then import on a fresh device gives the same records exactly', async ({
	page,
	browser,
	baseURL
}) => {
	await saveDemo(page, 'Export one', 'East block');
	await saveDemo(page, 'Export two', 'West block');
	const first = await exportFile(page);
	const exported = JSON.parse(first);
	expect(exported.format).toBe('hingepoint.backup');
	expect(exported.records.map((r: { title: string }) => r.title).sort()).toEqual([
		'Export one',
		'Export two'
	]);

	// A second phone: its own, empty database.
	const other = await browser.newContext({ baseURL, viewport: { width: 360, height: 780 } });
	const fresh = await other.newPage();
	await fresh.addInitScript((key) => localStorage.setItem(key, 'test'), NOTICE_KEY);
	await fresh.goto('/');
	await expect(fresh.getByTestId('empty-list')).toBeVisible();
	await importText(fresh, first);
	await expect(fresh.getByTestId('import-message')).toHaveText('Added 2 checks.');
	await expect(fresh.getByTestId('saved-item')).toHaveCount(2);
	const again = JSON.parse(await exportFile(fresh));
	// The same records; each phone computes its own verdicts.
	const plain = (records: object[]) => records.map((r) => ({ ...r, computed: null }));
	expect(plain(again.records)).toEqual(plain(exported.records));

	// The same file twice adds nothing.
	await importText(fresh, first);
	await expect(fresh.getByTestId('import-message')).toHaveText('Nothing added, 2 already here.');
	await expect(fresh.getByTestId('saved-item')).toHaveCount(2);
	await other.close();
});

test('a damaged or foreign backup is refused and nothing changes', async ({ page }) => {
	await saveDemo(page, 'Keep me');
	const before = JSON.parse(await exportFile(page)).records;
	const good = JSON.stringify({ ...JSON.parse(await exportFile(page)) });

	await importText(page, good.slice(0, Math.floor(good.length / 2)));
	await expect(page.getByTestId('import-message')).toContainText('Backup refused, nothing changed');
	await importText(page, JSON.stringify({ format: 'someone-else', records: [] }));
	await expect(page.getByTestId('import-message')).toContainText('Backup refused, nothing changed');
	await importText(page, good.replace(/"records":\s*\[/, '"__proto__":{},"records":['));
	await expect(page.getByTestId('import-message')).toContainText('__proto__');
	await expect(page.getByTestId('saved-item')).toHaveCount(1);
	expect(JSON.parse(await exportFile(page)).records).toEqual(before);
});

test('a backup cannot replace, hide or vouch for a check: it is added beside and checked again', async ({
	page
}) => {
	await saveDemo(page, 'Kept here');
	const file = JSON.parse(await exportFile(page));
	const [mine] = file.records;
	await expect(page.getByTestId('saved-verdict')).toHaveText('✔ Pass');
	const overloaded = JSON.parse(await readFile('test/fixtures/cases/demo-overloaded.json', 'utf8'));
	const claim = { verdict: 'pass', answer: { verdict: 'pass' } };
	file.records = [
		// Same id, far-future date, an old deletion mark and a pass it does not have.
		{
			...mine,
			input: overloaded,
			result: claim,
			computed: { verdict: 'pass', computedBy: file.engineVersion },
			updatedAt: '2999-01-01T00:00:00.000Z',
			deletedAt: '2000-01-01T00:00:00.000Z'
		},
		{
			...mine,
			id: 'broken-1',
			title: 'Broken',
			input: { ...mine.input, beam: { spans: [-1] } },
			result: claim
		}
	];
	await importText(page, JSON.stringify(file));
	const message = page.getByTestId('import-message');
	await expect(message).toHaveAttribute('aria-live', 'polite');
	await expect(message).toHaveText(
		'Added 2 checks, 1 kept beside an existing one with the same id. 1 check needs attention: the inputs did not pass validation, so no verdict is shown.'
	);
	await page.reload();
	const items = page.getByTestId('saved-item');
	await expect(items).toHaveCount(3);
	await expect(
		items.filter({ hasText: 'Kept here (imported)' }).getByTestId('saved-verdict')
	).toHaveText('✖ Fail');
	await expect(items.filter({ hasText: 'Broken' }).getByTestId('saved-verdict')).toHaveText(
		'⚠ Needs attention'
	);
	const original = items.filter({
		has: page.getByTestId('saved-title').getByText('Kept here', { exact: true })
	});
	await expect(original.getByTestId('saved-verdict')).toHaveText('✔ Pass');
	// The list with what the import added, and its message: clean for axe (WCAG 2.x A and AA).
	const axe = await new AxeBuilder({ page })
		.withTags(['wcag2a', 'wcag2aa', 'wcag21aa', 'wcag22aa'])
		.analyze();
	expect(axe.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target).join(' ')}`)).toEqual(
		[]
	);
	// The original opens as it was.
	const now = JSON.parse(await exportFile(page)).records.find(
		(r: { id: string }) => r.id === mine.id
	);
	expect(now).toEqual({ ...mine, computed: { verdict: 'pass', computedBy: file.engineVersion } });
});
