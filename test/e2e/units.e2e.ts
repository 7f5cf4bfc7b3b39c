/**
 * Units: switching to US customary changes every shown value and never the stored case (SI).
 * Conversions use the exact definitions ft = 0.3048 m and kip = 4.4482216152605 kN (NIST SP 811,
 * Appendix B).
 */
import type { Page } from '@playwright/test';
import { fieldAt, openCheck, readLoadFactor, saveDemo, typeInto } from './check-helpers';
import { test, expect } from './fixtures';

const FT = 0.3048;
const KIP = 4.4482216152605;

async function chooseUnits(page: Page, units: 'SI' | 'US'): Promise<void> {
	await page.goto('/settings');
	await page.getByTestId(`units-${units}`).check();
	await expect(page.getByTestId('settings-status')).toHaveText('Saved.');
}

/** The stored record's case, read straight from IndexedDB. */
async function readStoredCase(
	page: Page,
	id: string
): Promise<{ beam: { spans: number[] }; loads: { value: number }[] }> {
	return page.evaluate(
		(key) =>
			new Promise((resolve, reject) => {
				const open = indexedDB.open('hingepoint');
				open.onerror = () => reject(open.error);
				open.onsuccess = () => {
					const get = open.result.transaction('checks').objectStore('checks').get(key);
					get.onsuccess = () => resolve(get.result.input);
					get.onerror = () => reject(get.error);
				};
			}),
		id
	);
}

test('US units change the fields and results shown, not the stored case', async ({ page }) => {
	await saveDemo(page, 'Units check');
	const id = new URL(page.url()).searchParams.get('id')!;
	const lambdaSI = await readLoadFactor(page);
	const allowedSI = Number.parseFloat(
		(await page.getByTestId('allowed-load').first().textContent()) ?? ''
	);

	await chooseUnits(page, 'US');
	await openCheck(page, `/check?id=${id}`);
	// 4.8 m shown in ft, rounded to four decimals for editing.
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue(
		String(Math.round((4.8 / FT) * 1e4) / 1e4)
	);
	await expect(page.locator('label[for="f-beam-spans-0"]')).toContainText('(ft)');
	await expect(fieldAt(page, 'loads[2].value')).toHaveValue(
		String(Math.round((12.625 / KIP) * 1e4) / 1e4)
	);
	// λ is a ratio: the same in any units. The allowed load is the same force in kip.
	expect(await readLoadFactor(page)).toBeCloseTo(lambdaSI, 3);
	const allowedUS = await page.getByTestId('allowed-load').first().textContent();
	expect(allowedUS).toMatch(/kip$/);
	expect(Number.parseFloat(allowedUS ?? '')).toBeCloseTo(allowedSI / KIP, 1);

	// Nothing was typed: the stored case is untouched, in SI.
	const stored = await readStoredCase(page, id);
	expect(stored.beam.spans[0]).toBe(4.8);
	expect(stored.loads[2].value).toBe(12.625);

	// A value typed in ft is kept in m.
	await typeInto(page, 'beam.spans[0]', '16');
	await page.getByTestId('open-save').click();
	await page.getByTestId('save-confirm').click();
	await expect(page.getByTestId('save-status')).toContainText('Saved');
	expect((await readStoredCase(page, id)).beam.spans[0]).toBeCloseTo(16 * FT, 12);

	await chooseUnits(page, 'SI');
	await openCheck(page, `/check?id=${id}`);
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue(String(Math.round(16 * FT * 1e4) / 1e4));
});
