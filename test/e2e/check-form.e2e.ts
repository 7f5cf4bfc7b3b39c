/**
 * The check form end to end on a phone: a case typed in gives the engine's answer, bad input is
 * named next to its field and gives no verdict, and a half-filled form survives a reload.
 */
import { checkCase } from '../../src/lib/engine/index';
import {
	enterSimpleBeam,
	fieldAt,
	openCheck,
	openDemo,
	readLoadFactor,
	typeInto
} from './check-helpers';
import { test, expect } from './fixtures';

test('a simply supported beam typed in gives λ = 4Mp/(L·γ·P) and the engine’s verdict', async ({
	page
}) => {
	await openCheck(page);
	// Decimal commas as typed on a phone keypad.
	await enterSimpleBeam(page, { span: '6,0', mp: '100', x: '3', load: '10' });
	// Simple plastic theory, central point load on a simply supported beam: collapse at W = 4Mp/L
	// (B.G. Neal, The Plastic Methods of Structural Analysis, beam mechanism; from memory). With the
	// temporary-load factor γ = 1.5 of EN 1990 Table A1.2(B) (recommended γQ, the default set):
	const Mp = 100;
	const L = 6;
	const gamma = 1.5;
	const P = 10;
	const expected = (4 * Mp) / (L * gamma * P);
	await expect.poll(() => readLoadFactor(page)).toBeCloseTo(expected, 3);

	// The same case through the engine in node: the screen shows its verdict.
	const same = checkCase({
		format: 'hingepoint.case',
		version: 1,
		beam: {
			spans: [6],
			supports: ['pin', 'pin'],
			section: { mp: 100 },
			restraint: { lateral: 'continuous', loadHeight: 'top-flange' }
		},
		loads: [{ kind: 'point', x: 3, value: 10, action: 'temporary' }],
		factors: {
			set: 'en1990-6.10',
			permanent: 1.35,
			imposed: 1.5,
			temporary: 1.5,
			gammaM0: 1,
			gammaM1: 1
		}
	});
	expect(same.ok).toBe(true);
	if (!same.ok) return;
	expect(same.report.collapse!.loadFactor).toBeCloseTo(expected, 9);
	await expect(page.getByTestId('verdict')).toHaveAttribute(
		'data-verdict',
		same.report.answer.verdict ?? 'none'
	);
	// Here bending governs, so the largest temporary load allowed is λ × P.
	expect(same.report.answer.governing?.id).toBe('bending');
	await expect(page.getByTestId('allowed-load').first()).toHaveText(
		`${(expected * P).toFixed(1)}\u00a0kN`
	);
});

test('bad input shows the field’s own message and no result', async ({ page }) => {
	await openDemo(page);
	await readLoadFactor(page);
	await typeInto(page, 'beam.spans[0]', '4.8m');
	const span = fieldAt(page, 'beam.spans[0]');
	await expect(span).toHaveAttribute('aria-invalid', 'true');
	const messageId = await span.getAttribute('aria-describedby');
	await expect(page.locator(`#${messageId}`)).toContainText('is not a number');
	await expect(page.getByTestId('load-factor')).toHaveCount(0);
	await expect(page.getByTestId('verdict')).toHaveCount(0);
	await expect(page.getByTestId('result-blocked')).toBeVisible();

	await typeInto(page, 'beam.spans[0]', '-2');
	await expect(page.locator(`#${messageId}`)).toHaveText(/Must be more than zero/);

	// A number that parses but that the engine refuses: the point load beyond the end of the beam.
	await typeInto(page, 'beam.spans[0]', '4,8');
	await typeInto(page, 'loads[2].x', '7');
	const x = fieldAt(page, 'loads[2].x');
	await expect(x).toHaveAttribute('aria-invalid', 'true');
	await expect(page.getByTestId('load-factor')).toHaveCount(0);
	await expect(page.getByTestId('verdict')).toHaveCount(0);

	await typeInto(page, 'loads[2].x', '2,1');
	await expect(x).not.toHaveAttribute('aria-invalid', 'true');
	await readLoadFactor(page);
});

test('a half-filled form survives a reload, typing mistakes included', async ({ page }) => {
	await openDemo(page);
	await readLoadFactor(page);
	await typeInto(page, 'loads[0].value', '4,25');
	await typeInto(page, 'beam.spans[0]', '5.2x');
	// Let the draft write finish (it is queued on every change).
	await page.waitForTimeout(500);
	await page.reload();
	await expect(fieldAt(page, 'loads[0].value')).toHaveValue('4,25');
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue('5.2x');
	await expect(fieldAt(page, 'beam.spans[0]')).toHaveAttribute('aria-invalid', 'true');
	await typeInto(page, 'beam.spans[0]', '5.2');
	await readLoadFactor(page);
});
