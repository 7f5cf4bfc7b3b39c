/**
 * The design basis: a default in settings, separate from units; chosen per check on the form;
 * shown on the result; kept by a shared link. ASCE 7-22 §2.3.1 factors on AISC LRFD (1.2D + 1.6L,
 * 1.4D; from memory), the proposed temporary load as live load (common practice).
 */
import { buildShareLink } from '../../src/lib/share/fragment';
import type { CaseFile } from '../../src/lib/ui/state/case-file';
import { fieldAt, openCheck } from './check-helpers';
import { test, expect } from './fixtures';

/** A W12x26 in A992 over 20 ft (6.096 m), 2 kip (8.896 kN) at midspan; SI as the form keeps it. */
const US_WALK: CaseFile = {
	format: 'hingepoint.case',
	version: 1,
	basis: 'aisc-lrfd',
	beam: {
		spans: [6.096],
		supports: ['pin', 'pin'],
		section: { designation: 'W12x26' },
		grade: 'A992',
		restraint: { lateral: 'ends-only', loadHeight: 'top-flange' }
	},
	loads: [{ kind: 'point', x: 3.048, value: 8.896, action: 'temporary' }],
	factors: { set: 'asce7-lrfd', permanent: 1.2, permanentAlone: 1.4, imposed: 1.6, temporary: 1.6 }
};

test('a shared AISC case opens on its basis, with ASCE 7 factors and an AISC answer', async ({
	page
}) => {
	await openCheck(page, buildShareLink('', US_WALK));
	await expect(page.getByTestId('design-basis')).toHaveValue('aisc-lrfd');
	await expect(fieldAt(page, 'factors.permanentAlone')).toHaveValue('1.4');
	await expect(page.getByTestId('result-basis')).toContainText('AISC 360-22 LRFD');
	await expect(page.getByTestId('grade')).toHaveValue('A992');
	await expect(page.getByTestId('grade').locator('option[value="S275"]')).toHaveCount(0);

	// Back to Eurocode: the EN factor set returns and the answer is on EN 1993.
	await page.getByTestId('design-basis').selectOption('eurocode');
	await expect(page.getByTestId('factor-set')).toBeVisible();
	await expect(fieldAt(page, 'factors.permanent')).toHaveValue('1.35');
	await expect(page.getByTestId('result-basis')).toContainText('EN 1993');
});

test('the default basis in settings starts a new check, whatever the units', async ({ page }) => {
	await page.goto('/settings');
	await page.getByTestId('basis-aisc-asd').check();
	await expect(page.getByTestId('settings-status')).toHaveText('Saved.');
	await page.getByTestId('units-SI').check();
	await openCheck(page, '/check?new');
	await page.getByTestId('start-blank').click();
	await expect(page.getByTestId('design-basis')).toHaveValue('aisc-asd');
	await expect(fieldAt(page, 'factors.permanent')).toHaveValue('1');
	await expect(fieldAt(page, 'factors.imposed')).toHaveValue('1');
});
