/**
 * On a phone (360 px, touch): a round or rectangular tube measured on site finds its nearest
 * table rows, and the grade follows the section until the user picks one. Sizes: CHS 168.3x6.3
 * is an EN 10210-2 size (from memory); HSS8x6x1/2 is 8 × 6 × 1/2 in nominal (AISC Shapes Database
 * v15.0). Usual grades: S355 for EN hollow sections, A500 Gr C for HSS (AISC Manual Table 2-4,
 * from memory).
 */
import { fieldAt, openCheck, typeInto } from './check-helpers';
import { test, expect } from './fixtures';

test.use({ viewport: { width: 360, height: 780 }, hasTouch: true, isMobile: true });

test('a measured round tube finds CHS 168.3x6.3; the grade follows until picked by hand', async ({
	page
}) => {
	await openCheck(page);
	await page.getByText('Measured sizes', { exact: true }).tap();
	await page.getByText('Round tube', { exact: true }).tap();
	await expect(fieldAt(page, 'beam.section.d')).toHaveValue('');
	await expect(fieldAt(page, 'beam.section.t')).toHaveValue('');
	await expect(page.getByTestId('grade')).toHaveValue('S355');
	const note = page.getByTestId('grade-note');
	await expect(note).toContainText('Steel grade set to S355');
	await expect(note).toContainText('the usual grade for a round tube on the Eurocode basis');
	await typeInto(page, 'beam.section.d', '168');
	await typeInto(page, 'beam.section.t', '6,3');
	const use = page.getByRole('button', { name: 'Use CHS 168.3x6.3', exact: true });
	await expect(use).toBeVisible();
	await use.tap();
	await expect(page.getByTestId('section-search')).toHaveValue('CHS 168.3x6.3');

	// A US tube measured either way up, in mm: its row is offered, and its grade follows.
	await page.getByText('Measured sizes', { exact: true }).tap();
	await page.getByText('Rectangular or square tube', { exact: true }).tap();
	await typeInto(page, 'beam.section.h', '152');
	await typeInto(page, 'beam.section.b', '203');
	await typeInto(page, 'beam.section.t', '12,7');
	const hss = page.getByRole('button', { name: 'Use HSS8x6x1/2', exact: true });
	await expect(hss).toBeVisible();
	await hss.tap();
	await expect(page.getByTestId('grade')).toHaveValue('A500-C');
	await expect(page.getByTestId('grade-note')).toContainText('the usual grade for HSS8x6x1/2');

	// A grade picked by hand stays whatever section follows.
	await page.getByTestId('grade').selectOption('S275');
	await expect(page.getByTestId('grade-note')).toHaveCount(0);
	await page.getByTestId('section-search').fill('HSS6.625x0.280');
	await expect(page.getByTestId('grade')).toHaveValue('S275');
	await expect(page.getByTestId('grade-note')).toHaveCount(0);
});
