/**
 * Helpers for driving the check form: fields are found by the case path they edit, the same path
 * the engine names in its messages.
 */
import type { Page } from '@playwright/test';
import { buildShareLink } from '../../src/lib/share/fragment';
import { createDemoCase } from '../../src/lib/ui/state/demo-case';
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

/** A new blank check is on screen: the span is empty and the result bar asks for it first. */
export async function expectBlankCheck(page: Page): Promise<void> {
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue('');
	await expect(page.getByTestId('live-chip')).toContainText(
		'Fix Span 1 — length: Not entered yet.'
	);
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
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue('');
	await page.getByText('Known Mp', { exact: true }).click();
	await typeInto(page, 'beam.spans[0]', o.span);
	await typeInto(page, 'beam.section.mp', o.mp);
	await page.getByRole('button', { name: '+ Point load' }).click();
	await page.getByTestId('action-0').selectOption('temporary');
	await typeInto(page, 'loads[0].x', o.x);
	await typeInto(page, 'loads[0].value', o.load);
	await page.getByText('Along its whole length', { exact: false }).click();
}

/** Opens the check screen (optionally at a path such as `/check?id=…`) and waits until its case is in. */
export async function openCheck(page: Page, path = '/check'): Promise<void> {
	await page.goto(path);
	await expect(page.getByTestId('check-heading')).toHaveAttribute('data-ready', 'true');
}

/**
 * Opens the worked demo as a new check: by its button while nothing is saved (first run), else
 * through a shared link of the same case (the button is offered on first run only).
 */
export async function openDemo(page: Page): Promise<void> {
	await openCheck(page, '/check?new');
	const demo = page.getByTestId('try-demo');
	if (await demo.isVisible()) await demo.click();
	else {
		// From another page: a change of the hash alone would not reload the check screen.
		await page.goto('/about');
		await openCheck(page, buildShareLink('', createDemoCase()));
	}
	await expect(page.getByTestId('demo-note')).toBeVisible();
}

/** Saves the demo check under a title, with a place and notes; ends on /check?id=…. */
export async function saveDemo(page: Page, title: string, building = 'Block A'): Promise<void> {
	await openDemo(page);
	await readLoadFactor(page);
	await page.getByTestId('open-save').click();
	await page.getByTestId('save-title').fill(title);
	await page.getByTestId('save-building').fill(building);
	await page.getByTestId('save-level').fill('B1');
	await page.getByTestId('save-grid').fill('C/4');
	await page.getByTestId('save-notes').fill('Pump change, hoist on trolley');
	await page.getByTestId('save-confirm').click();
	await expect(page.getByTestId('save-status')).toContainText('Saved');
	await expect(page).toHaveURL(/\/check\?id=/);
}
