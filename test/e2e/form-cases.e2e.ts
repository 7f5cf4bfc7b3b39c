/**
 * More cases entered through the form, each checked against a closed form or against the engine
 * run in node on the case the form should have built.
 */
import { checkCase } from '../../src/lib/engine/index';
import { fieldAt, openCheck, openDemo, readLoadFactor, typeInto } from './check-helpers';
import { test, expect } from './fixtures';

test('a continuous beam with a simple joint gives the engine’s λ and verdict for the same case', async ({
	page
}) => {
	await openDemo(page);
	await readLoadFactor(page);
	await page.getByText('Continuous', { exact: true }).click();
	await page.getByTestId('span-count').selectOption('3');
	await expect(fieldAt(page, 'beam.spans[2]')).toHaveValue('4.8');
	await typeInto(page, 'beam.spans[1]', '3,6');
	await page.getByLabel('Joint over support 3').selectOption('simple');
	// The hoist is moved into the middle span.
	await typeInto(page, 'loads[2].x', '6,3');

	const same = checkCase(
		{
			format: 'hingepoint.case',
			version: 1,
			title: 'DEMO — plant room beam, pump change hoist',
			beam: {
				spans: [4.8, 3.6, 4.8],
				supports: ['pin', 'pin', 'pin', 'pin'],
				joints: ['continuous', 'simple'],
				section: { designation: 'UB 254x146x31' },
				grade: 'S275',
				sectionLoss: 0,
				selfWeight: true,
				restraint: { lateral: 'continuous', loadHeight: 'bottom-flange' },
				bearing: [100, 100, 100, 100],
				bearingLoads: 50
			},
			// Whole-beam loads follow the new length (13.2 m).
			loads: [
				{ kind: 'uniform', from: 0, to: 13.2, value: 3.2, action: 'permanent' },
				{ kind: 'uniform', from: 0, to: 13.2, value: 1.5, action: 'imposed' },
				{ kind: 'point', x: 6.3, value: 12.625, action: 'temporary' }
			],
			factors: {
				set: 'en1990-6.10',
				permanent: 1.35,
				imposed: 1.5,
				temporary: 1.5,
				gammaM0: 1,
				gammaM1: 1
			},
			deflectionLimit: 200
		},
		{ curve: false }
	);
	expect(same.ok).toBe(true);
	if (!same.ok) return;
	const lambda = same.report.collapse!.loadFactor;
	expect(lambda).not.toBeNull();
	await expect.poll(() => readLoadFactor(page)).toBeCloseTo(lambda!, 3);
	await expect(page.getByTestId('verdict')).toHaveAttribute(
		'data-verdict',
		same.report.answer.verdict ?? 'none'
	);
	await expect(page.getByTestId('beam-drawing')).toHaveAttribute('aria-label', /over 3 spans/);
});

test('the chain hoist template adds 10.1 kN × 1.25 as a proposed temporary point load', async ({
	page
}) => {
	await openCheck(page);
	await page.getByTestId('start-blank').click();
	await page.getByText('Known Mp', { exact: true }).click();
	await typeInto(page, 'beam.spans[0]', '6');
	await typeInto(page, 'beam.section.mp', '100');
	await page.getByText('Along its whole length', { exact: false }).click();
	await page.getByText('Quick temporary loads', { exact: false }).click();
	await page.locator('#tpl-chain-hoist-x').fill('3');
	await page.getByTestId('add-template-chain-hoist').click();
	// Demo values of the template: 10.1 kN (1 t rated + hoist + trolley) × dynamic factor 1.25.
	const P = 10.1 * 1.25;
	await expect(fieldAt(page, 'loads[0].value')).toHaveValue(String(P));
	// Said beside the button tapped, and read out (a polite live region).
	const added = page.getByTestId('added-chain-hoist');
	await expect(added).toHaveAttribute('aria-live', 'polite');
	await expect(added).toContainText('as Load 1');
	await expect(page.getByTestId('load-0')).toContainText('Proposed temporary');
	// Simply supported, central point load: λ = 4Mp/(L·γ·P) (simple plastic theory, beam
	// mechanism; B.G. Neal, from memory) with γ = 1.5 (EN 1990 Table A1.2(B), recommended).
	await expect.poll(() => readLoadFactor(page)).toBeCloseTo((4 * 100) / (6 * 1.5 * P), 3);
});

test('a load the beam cannot carry reads FAIL in words and symbol, with λ below 1', async ({
	page
}) => {
	await openCheck(page);
	await page.getByTestId('start-blank').click();
	await page.getByText('Known Mp', { exact: true }).click();
	await typeInto(page, 'beam.spans[0]', '6');
	await typeInto(page, 'beam.section.mp', '100');
	await page.getByText('Along its whole length', { exact: false }).click();
	await page.getByRole('button', { name: '+ Point load' }).click();
	await page.getByTestId('action-0').selectOption('temporary');
	await typeInto(page, 'loads[0].x', '3');
	await typeInto(page, 'loads[0].value', '50');
	// λ = 4Mp/(L·γ·P) = 400/(6·1.5·50) = 0.889 < 1 (simple plastic theory; EN 1990 γQ = 1.5).
	await expect.poll(() => readLoadFactor(page)).toBeCloseTo(400 / (6 * 1.5 * 50), 3);
	const banner = page.getByTestId('verdict');
	await expect(banner).toHaveAttribute('data-verdict', 'fail');
	await expect(banner).toContainText('FAIL');
	await expect(banner).toContainText('✖');
	await expect(page.getByTestId('live-chip')).toContainText('FAIL');
});

test('restraint only at the supports: the screen names the engine’s route and its reason', async ({
	page
}) => {
	await openDemo(page);
	await readLoadFactor(page);
	await page.getByText('Only at the supports', { exact: true }).click();
	const demo = {
		format: 'hingepoint.case' as const,
		version: 1 as const,
		beam: {
			spans: [4.8],
			supports: ['pin' as const, 'pin' as const],
			joints: [],
			section: { designation: 'UB 254x146x31' },
			grade: 'S275',
			sectionLoss: 0,
			selfWeight: true,
			restraint: { lateral: 'ends-only' as const, loadHeight: 'bottom-flange' as const },
			bearing: [100, 100],
			bearingLoads: 50
		},
		loads: [
			{ kind: 'uniform' as const, from: 0, to: 4.8, value: 3.2, action: 'permanent' as const },
			{ kind: 'uniform' as const, from: 0, to: 4.8, value: 1.5, action: 'imposed' as const },
			{ kind: 'point' as const, x: 2.1, value: 12.625, action: 'temporary' as const }
		],
		factors: {
			set: 'en1990-6.10',
			permanent: 1.35,
			imposed: 1.5,
			temporary: 1.5,
			gammaM0: 1,
			gammaM1: 1
		},
		deflectionLimit: 200
	};
	const same = checkCase(demo);
	expect(same.ok).toBe(true);
	if (!same.ok) return;
	const { design } = same.report;
	const { verdict, governing } = same.report.answer;
	// Restrained only at the supports, the plastic route is not the engine's choice here.
	expect(design.route.route).not.toBe('plastic');
	expect(design.route.reasons.length).toBeGreaterThan(0);
	await expect(page.getByTestId('verdict')).toHaveAttribute('data-verdict', verdict ?? 'none');
	for (const reason of design.route.reasons)
		await expect(page.getByTestId('route')).toContainText(reason);
	await expect(page.getByTestId('governing')).toHaveText(governing?.label ?? '—');
});
