/**
 * On site with a phone (360 px, touch): "New check" is always a new blank check, edits of a saved
 * check become revisions and unsaved edits are kept, confirmations appear where the user tapped,
 * an incomplete check cannot be saved as finished, and nothing starts pre-filled.
 */
import AxeBuilder from '@axe-core/playwright';
import type { Page } from '@playwright/test';
import {
	expectBlankCheck,
	fieldAt,
	openCheck,
	openDemo,
	readLoadFactor,
	saveDemo,
	typeInto
} from './check-helpers';
import { test, expect } from './fixtures';

test.use({ viewport: { width: 360, height: 780 }, hasTouch: true, isMobile: true });

const AXE_TAGS = ['wcag2a', 'wcag2aa', 'wcag21aa', 'wcag22aa'];
const FIX_SPAN = 'Fix Span 1 — length first';

/** Header link "New check", as a user taps it. */
async function tapNewCheck(page: Page): Promise<void> {
	await page
		.getByRole('navigation', { name: 'Main' })
		.getByRole('link', { name: 'New check' })
		.tap();
	await expect(page.getByTestId('check-heading')).toHaveAttribute('data-ready', 'true');
}

/** Span 6 m, Mp 100 kNm, restrained throughout, one proposed temporary point load P at x. */
async function enterKnownMpBeam(page: Page, x: string, p: string): Promise<void> {
	await typeInto(page, 'beam.spans[0]', '6');
	await page.getByText('Known Mp', { exact: true }).tap();
	await typeInto(page, 'beam.section.mp', '100');
	await page.getByText('Along its whole length', { exact: false }).tap();
	await page.getByRole('button', { name: '+ Point load' }).tap();
	await page.getByTestId('action-0').selectOption('temporary');
	await typeInto(page, 'loads[0].x', x);
	await typeInto(page, 'loads[0].value', p);
}

async function saveAs(page: Page, title: string): Promise<void> {
	await page.getByTestId('open-save').tap();
	await page.getByTestId('save-title').fill(title);
	await page.getByTestId('save-confirm').tap();
	await expect(page.getByTestId('save-status')).toContainText('Saved');
}

test('the demo is offered on first run only, and "New check" never shows the saved check', async ({
	page
}) => {
	await openCheck(page);
	// First run: a blank check, with the worked demo one tap away.
	await expectBlankCheck(page);
	await expect(page.getByTestId('try-demo')).toHaveText('Try a worked demo');
	await expect(page.getByTestId('demo-note')).toHaveCount(0);

	await saveDemo(page, 'Plant room beam');
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue('4.8');
	await tapNewCheck(page);
	await expectBlankCheck(page);
	await expect(page).toHaveURL(/\/check$/);
	await expect(page.getByTestId('revisions')).toHaveCount(0);
	await expect(page.getByTestId('try-demo')).toHaveCount(0);
	await expect(page.getByTestId('open-save')).toHaveText(FIX_SPAN);

	// Filled in and saved, it is a second check; the first keeps its span.
	await enterKnownMpBeam(page, '3', '10');
	await expect(page.getByTestId('open-save')).toHaveText('Save this check');
	await saveAs(page, 'Second beam');
	await page.goto('/');
	await expect(page.getByTestId('saved-item')).toHaveCount(2);
	await page
		.getByTestId('saved-item')
		.filter({ hasText: 'Plant room beam' })
		.getByRole('link')
		.first()
		.tap();
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue('4.8');

	// The page's own button does the same as the header link.
	await page.getByTestId('start-blank').tap();
	await expectBlankCheck(page);
});

test('editing a saved check adds a revision; restoring the first brings the old span back', async ({
	page
}) => {
	await saveDemo(page, 'Revised beam');
	await typeInto(page, 'beam.spans[0]', '5,2');
	await readLoadFactor(page);
	await page.getByTestId('open-save').tap();
	await page.getByTestId('save-confirm').tap();
	const status = page.getByTestId('save-status');
	await expect(status).toHaveText('Saved. 1 earlier version kept.');
	// The confirmation sits right under the button, read out politely, and is on screen.
	await expect(status).toHaveAttribute('aria-live', 'polite');
	await expect(status).toBeInViewport();
	const button = await page.getByTestId('open-save').boundingBox();
	const said = await status.boundingBox();
	expect(said!.y - (button!.y + button!.height)).toBeLessThan(48);

	await expect(page.getByTestId('revision')).toHaveCount(2);
	await page.getByRole('button', { name: 'Restore version 1' }).tap();
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue('4.8');
	await expect(page.getByTestId('unsaved-note')).toContainText('not saved yet');
	// Saving the restored version keeps the 5.2 m one as well.
	await readLoadFactor(page);
	await page.getByTestId('open-save').tap();
	await page.getByTestId('save-confirm').tap();
	await expect(status).toHaveText('Saved. 2 earlier versions kept.');
	await expect(page.getByTestId('revision')).toHaveCount(3);
	await page.getByRole('button', { name: 'Restore version 2' }).tap();
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue('5.2');
});

test('unsaved edits of a saved check come back after leaving or reloading, and say so', async ({
	page
}) => {
	await saveDemo(page, 'Draft beam');
	const address = page.url();
	await typeInto(page, 'beam.spans[0]', '5,5');
	await page.waitForTimeout(400);
	await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Saved' }).tap();
	await page.getByTestId('saved-item').getByRole('link').first().tap();
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue('5,5');
	await expect(page.getByTestId('unsaved-note')).toContainText('Unsaved changes from');

	await page.reload();
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue('5,5');
	await expect(page.getByTestId('unsaved-note')).toBeVisible();
	// Going back to the saved version is the user's choice, and the stored check was never touched.
	await page.getByTestId('show-saved').tap();
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue('4.8');
	await expect(page.getByTestId('unsaved-note')).toHaveCount(0);
	await page.goto(address);
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue('4.8');
});

test('"New check" sets an unsaved new check aside, and it can be reopened', async ({ page }) => {
	await openCheck(page);
	await typeInto(page, 'beam.spans[0]', '7,25');
	await page.waitForTimeout(400);
	await tapNewCheck(page);
	await expectBlankCheck(page);
	const aside = page.getByTestId('aside-item');
	await expect(aside).toHaveCount(1);
	await aside.getByRole('button', { name: /^Reopen/ }).tap();
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue('7,25');
	await expect(page.getByTestId('aside-item')).toHaveCount(0);
	// A new check in progress also survives a reload.
	await page.reload();
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue('7,25');
});

test('an incomplete check cannot be saved: the button says why and leads to the field', async ({
	page
}) => {
	await openCheck(page);
	await enterKnownMpBeam(page, '', '10');
	const save = page.getByTestId('open-save');
	await expect(save).toHaveText('Fix Load 1 — position from left end first');
	await expect(save).toHaveAttribute('aria-disabled', 'true');
	await expect(page.getByTestId('live-chip')).toContainText(
		'Fix Load 1 — position from left end: Not entered yet.'
	);
	await save.tap({ force: true });
	await expect(fieldAt(page, 'loads[0].x')).toBeFocused();
	await expect(page.getByTestId('save-dialog')).toHaveCount(0);

	// A typing mistake blocks it the same way.
	await typeInto(page, 'loads[0].x', '3m');
	await expect(save).toHaveText('Fix Load 1 — position from left end first');
	await typeInto(page, 'loads[0].x', '3');
	// λ = 4Mp/(L·γ·P) = 400/(6·1.5·10) (simple plastic theory, beam mechanism; EN 1990 γQ = 1.5).
	await expect.poll(() => readLoadFactor(page)).toBeCloseTo(400 / (6 * 1.5 * 10), 3);
	await expect(save).toHaveText('Save this check');
	await expect(save).not.toHaveAttribute('aria-disabled', 'true');
	await saveAs(page, 'Complete now');
	await page.goto('/');
	await expect(page.getByTestId('saved-item')).toHaveCount(1);
	await expect(page.getByTestId('saved-verdict')).toHaveAttribute('data-verdict', 'pass');
});

test('new loads and measured sizes start empty; a blank root radius is taken as 0 and says so', async ({
	page
}) => {
	await openCheck(page);
	await page.getByRole('button', { name: '+ Point load' }).tap();
	await expect(fieldAt(page, 'loads[0].value')).toHaveValue('');
	await expect(fieldAt(page, 'loads[0].x')).toHaveValue('');
	const action = page.getByTestId('action-0');
	await expect(action).toHaveValue('');
	await expect(action.locator('option:checked')).toHaveText('Choose…');
	await page.getByRole('button', { name: '+ Uniform, whole beam' }).tap();
	await expect(fieldAt(page, 'loads[1].value')).toHaveValue('');
	await expect(page.getByTestId('action-1')).toHaveValue('');

	// A designation first, then measured sizes: nothing carried over, root radius included.
	await page.getByTestId('section-search').fill('UB 254x146x31');
	await page.getByText('Measured sizes', { exact: true }).tap();
	for (const key of ['h', 'b', 'tw', 'tf', 'r'])
		await expect(fieldAt(page, `beam.section.${key}`)).toHaveValue('');
	await expect(page.locator('#f-beam-section-r-hint')).toContainText('r = 0');
	await expect(page.locator('#f-beam-section-r-hint')).toContainText('smallest section properties');
	await typeInto(page, 'beam.section.h', '257');
	await typeInto(page, 'beam.section.b', '146');
	await typeInto(page, 'beam.section.tw', '6,1');
	await typeInto(page, 'beam.section.tf', '8,6');
	await expect(fieldAt(page, 'beam.section.r')).toHaveValue('');
	await expect(fieldAt(page, 'beam.section.r')).not.toHaveAttribute('aria-invalid', 'true');
	// The section is complete: what is left to fix is elsewhere.
	await expect(page.getByTestId('live-chip')).not.toContainText('Section');
});

test('the hoist template hangs from the bottom flange only when ticked, and says what it added', async ({
	page
}) => {
	await openCheck(page);
	await typeInto(page, 'beam.spans[0]', '6');
	await page.getByTestId('section-search').fill('UB 254x146x31');
	await page.getByText('Quick temporary loads', { exact: false }).tap();
	await page.locator('#tpl-chain-hoist-x').fill('3');
	const add = page.getByTestId('add-template-chain-hoist');
	await add.tap();
	const added = page.getByTestId('added-chain-hoist');
	await expect(added).toHaveText('Added 12.6 kN as Load 1, on the top flange.');
	await expect(added).toHaveAttribute('aria-live', 'polite');
	await expect(added).toBeInViewport();
	const result = page.locator('#result');
	await expect(result).toContainText('load applied at the top flange', { timeout: 20_000 });

	await page.getByRole('button', { name: 'Remove load 1' }).tap();
	await page.getByTestId('hangs-chain-hoist').check();
	await add.tap();
	await expect(added).toHaveText('Added 12.6 kN as Load 1, hung from the bottom flange.');
	await expect(result).toContainText('load hung from the bottom flange', { timeout: 20_000 });
	await expect(result).not.toContainText('load applied at the top flange');
});

test('the check screen with things to fix, a set-aside check and a template load: no axe violations', async ({
	page
}) => {
	await openCheck(page);
	await typeInto(page, 'beam.spans[0]', '5');
	await page.waitForTimeout(400);
	await tapNewCheck(page);
	await expect(page.getByTestId('aside-item')).toHaveCount(1);
	await page.getByRole('button', { name: '+ Point load' }).tap();
	await page.getByText('Quick temporary loads', { exact: false }).tap();
	await page.locator('#tpl-chain-hoist-x').fill('2');
	await page.getByTestId('add-template-chain-hoist').tap();
	await expect(page.getByTestId('added-chain-hoist')).toContainText('as Load 2');
	await expect(page.getByTestId('open-save')).toHaveText(FIX_SPAN);
	await page.screenshot({ path: 'test-results/screens/check-to-fix-360.png', fullPage: true });
	const result = await new AxeBuilder({ page }).withTags(AXE_TAGS).analyze();
	expect(
		result.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target).join(' ')}`)
	).toEqual([]);
});

test('the worked demo still opens and computes from its button', async ({ page }) => {
	await openDemo(page);
	expect(await readLoadFactor(page)).toBeGreaterThan(0);
});
