/**
 * The answer first, on a 360 px touch phone: after an edit at the top of the form the docked bar
 * shows the verdict in word and symbol, the largest proposed load in its own unit and the
 * governing check with its utilisation, the same figures as the full result; the bar keeps its
 * own room (a focused field and the footer stay clear of it); PASS reads as screening only with
 * the engineer-of-record notice right under it; λ is labelled a detail; the drawings say which
 * analysis they show; the capacity curve says which check governs where. The expected figures
 * come from the engine run here on the same case (its own numbers are tested against published
 * sources in test/validation).
 */
import AxeBuilder from '@axe-core/playwright';
import type { Page } from '@playwright/test';
import { checkCase } from '../../src/lib/engine';
import { formatQuantity } from '../../src/lib/ui/format';
import { createDemoCase } from '../../src/lib/ui/state/demo-case';
import { fieldAt, openDemo, readLoadFactor, typeInto } from './check-helpers';
import { test, expect } from './fixtures';

test.use({ viewport: { width: 360, height: 780 }, hasTouch: true, isMobile: true });

const AXE_TAGS = ['wcag2a', 'wcag2aa', 'wcag21aa', 'wcag22aa'];

/** The bar's top edge, px from the top of the viewport. */
async function barTop(page: Page): Promise<number> {
	return (await page.getByTestId('result-bar').boundingBox())!.y;
}

test('the docked bar gives the answer after an edit at the top and covers nothing', async ({
	page
}) => {
	test.setTimeout(150_000);
	await openDemo(page);
	await readLoadFactor(page);
	// An edit at the top of the form: the span, 4.8 m → 5 m.
	await page.evaluate(() => window.scrollTo(0, 0));
	await typeInto(page, 'beam.spans[0]', '5');
	const c = createDemoCase();
	c.beam.spans = [5];
	for (const l of c.loads) if (l.kind !== 'point') l.to = 5;
	const out = checkCase(c);
	if (!out.ok) throw new Error('the demo with a 5 m span is valid');
	const a = out.report.answer;
	expect(a.verdict).toBe('pass');
	const allowed = formatQuantity(a.allowable[0].value!, 'force', 'SI');
	const percent = `${Math.round(a.utilisation! * 100)}%`;

	const bar = page.getByTestId('live-chip');
	await expect(bar).toContainText('✔ PASS');
	await expect(page.getByTestId('bar-allowed')).toHaveText(
		`max ${allowed} (load ${a.allowable[0].load + 1})`
	);
	await expect(page.getByTestId('bar-governing')).toHaveText(`${a.governing!.label} ${percent}`);
	// On screen without scrolling: the span field the user typed in, and the bar.
	await expect(fieldAt(page, 'beam.spans[0]')).toBeInViewport();
	await expect(bar).toBeInViewport();
	await expect(page.getByTestId('result-bar')).toContainText('engineer of record decides');
	// The full result says the same.
	await expect(page.getByTestId('allowed-load').first()).toHaveText(allowed);
	await expect(page.getByTestId('governing')).toHaveText(a.governing!.label);
	await expect(page.getByTestId('governing-utilisation')).toHaveText(percent);

	// A focused field low on the form scrolls clear of the bar; so does the footer at the end.
	for (const path of ['loads[2].value', 'loads[2].x']) {
		const field = fieldAt(page, path);
		await field.focus();
		await field.scrollIntoViewIfNeeded();
		const box = (await field.boundingBox())!;
		expect(box.y + box.height).toBeLessThanOrEqual(await barTop(page));
	}
	await page.evaluate(() => window.scrollTo(0, document.body.scrollHeight));
	const footer = (await page.getByTestId('notice-link').boundingBox())!;
	expect(footer.y + footer.height).toBeLessThanOrEqual(await barTop(page));

	// The bar leads to the full result.
	await bar.tap();
	await expect(page.getByTestId('verdict')).toBeInViewport();
});

test('PASS reads as screening only, the notice sits under it, λ is a labelled detail, the plastic drawings show where plastic decides', async ({
	page
}) => {
	test.setTimeout(150_000);
	await openDemo(page);
	await readLoadFactor(page);
	const out = checkCase(createDemoCase(), { curve: true });
	if (!out.ok) throw new Error('the demo is valid');
	expect(out.report.collapse?.decides).toBe(true);

	const verdict = page.getByTestId('verdict');
	await expect(verdict).toContainText('PASS');
	await expect(verdict).toContainText(
		'Within capacity for the inputs entered — screening only, not an approval.'
	);
	// The engineer-of-record notice is the very next thing after the verdict.
	expect(await verdict.evaluate((el) => el.nextElementSibling?.getAttribute('data-testid'))).toBe(
		'engineer-notice'
	);
	await expect(page.locator('#result')).toContainText(
		'Plastic collapse in bending (one check, not the answer): λ ='
	);
	await expect(page.getByText('Moment at plastic collapse (the route that decides)')).toBeVisible();
	await expect(page.getByTestId('mechanism-drawing')).toBeVisible();

	// The capacity curve names the check that governs along each stretch of the beam.
	const stretches = out.report.capacityCurve!.stretches;
	expect(stretches.length).toBeGreaterThan(1);
	const along = stretches
		.map(
			(s) =>
				`${s.governing.label} ${formatQuantity(s.from, 'length', 'SI')}–${formatQuantity(s.to, 'length', 'SI')}`
		)
		.join('; ');
	await expect(page.getByTestId('curve-governs')).toHaveText(
		`Governing along the beam (dashed lines where it changes): ${along}.`,
		{ timeout: 30_000 }
	);
	await expect(page.getByTestId('curve-change')).toHaveCount(stretches.length - 1);
	await expect(page.getByTestId('capacity-curve')).toHaveAttribute(
		'aria-label',
		`Largest single point load along the beam. Least ${formatQuantity(out.report.capacityCurve!.min!.p, 'force', 'SI')} at ${formatQuantity(out.report.capacityCurve!.min!.x, 'length', 'SI')}.`
	);
});

test('where the plastic route is refused the drawings show elastic design moments and no mechanism', async ({
	page
}) => {
	test.setTimeout(150_000);
	await openDemo(page);
	await readLoadFactor(page);
	await page.getByText('Only at the supports', { exact: true }).tap();
	const route = page.getByTestId('route');
	await expect(route).toContainText('elastic analysis', { timeout: 20_000 });
	await expect(
		page.getByText('Elastic design moments against the resistance that governs')
	).toBeVisible();
	await expect(page.getByText('Moment at plastic collapse')).toHaveCount(0);
	await expect(page.getByTestId('mechanism-drawing')).toHaveCount(0);
	await expect(page.locator('#result')).toContainText('it does not decide here');
	const result = await new AxeBuilder({ page }).withTags(AXE_TAGS).analyze();
	expect(
		result.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target).join(' ')}`)
	).toEqual([]);
});

test('an input the engine refuses is named as on screen, 1-based, and the bar leads to it', async ({
	page
}) => {
	test.setTimeout(120_000);
	await openDemo(page);
	await readLoadFactor(page);
	// Load 3's position beyond the 4.8 m beam: a number, refused by the engine.
	await typeInto(page, 'loads[2].x', '7');
	const chip = page.getByTestId('live-chip');
	await expect(chip).toContainText('Fix Load 3 — position from left end', { timeout: 20_000 });
	await expect(page.getByTestId('open-save')).toHaveText(
		'Fix Load 3 — position from left end first'
	);
	// No internal path anywhere on the page.
	const words = await page.locator('body').innerText();
	expect(words).not.toMatch(/\bloads\[\d|\bbeam\.[a-z]|\[\d+\]/);
	// The bar takes the user to the field.
	await page.evaluate(() => window.scrollTo(0, 0));
	await chip.tap();
	const field = fieldAt(page, 'loads[2].x');
	await expect(field).toBeInViewport();
	const box = (await field.boundingBox())!;
	expect(box.y + box.height).toBeLessThanOrEqual(await barTop(page));
	await expect(page.getByTestId('verdict')).toHaveCount(0);
});
