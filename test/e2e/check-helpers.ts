/**
 * Helpers for driving the check form: fields are found by the case path they edit, the same path
 * the engine names in its messages.
 */
import type { Page } from '@playwright/test';
import { expect } from './fixtures';

/** The DOM id the form gives the field at a case path (mirrors src/routes/check/field-id.ts). */
export function fieldIdOf(path: string): string {
	return `f-${path.replace(/[^a-zA-Z0-9]+/g, '-').replace(/-$/, '')}`;
}

/** Replaces the text of the numeric field at a case path. */
export async function typeInto(page: Page, path: string, text: string): Promise<void> {
	await page.getByTestId(`field-${fieldIdOf(path)}`).fill(text);
}

/** The text shown in the numeric field at a case path. */
export function fieldAt(page: Page, path: string) {
	return page.getByTestId(`field-${fieldIdOf(path)}`);
}

/** Waits for a computed result and returns λ as shown. */
export async function readLoadFactor(page: Page): Promise<number> {
	const shown = page.getByTestId('load-factor');
	await expect(shown).toHaveText(/^\d/);
	return Number.parseFloat((await shown.textContent()) ?? '');
}

/**
 * Enters a simply supported beam of span L (m) with a known Mp (kNm), restrained along its
 * length, and one proposed temporary point load P (kN) at x (m), starting from a blank form.
 */
export async function enterSimpleBeam(
	page: Page,
	o: { span: string; mp: string; x: string; load: string }
): Promise<void> {
	await page.getByTestId('start-blank').click();
	await page.getByText('Known Mp', { exact: true }).click();
	await typeInto(page, 'beam.spans[0]', o.span);
	await typeInto(page, 'beam.section.mp', o.mp);
	await page.getByRole('button', { name: '+ Point load' }).click();
	await typeInto(page, 'loads[0].x', o.x);
	await typeInto(page, 'loads[0].value', o.load);
	await page.getByText('Along its whole length', { exact: false }).click();
}

/** Opens the check screen (optionally at a path such as `/check?id=…`) and waits until its case is in. */
export async function openCheck(page: Page, path = '/check'): Promise<void> {
	await page.goto(path);
	await expect(page.getByTestId('check-heading')).toHaveAttribute('data-ready', 'true');
}

/** Saves the demo check under a title, with a place and notes; ends on /check?id=…. */
export async function saveDemo(page: Page, title: string, building = 'Block A'): Promise<void> {
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
