/**
 * Sharing from the phone: the Web Share API gets the short summary with the verdict and the
 * engineer-of-record notice plus a link; without it the text goes to the clipboard and the app
 * says so; the link reopens the same inputs.
 */
import { ENGINEER_NOTICE_SHORT } from '../../src/lib/engine/notice';
import {
	expectBlankCheck,
	fieldAt,
	openCheck,
	openDemo,
	readLoadFactor,
	typeInto
} from './check-helpers';
import { test, expect } from './fixtures';

const WORDS = { pass: 'PASS', fail: 'FAIL', 'outside-scope': 'OUTSIDE SCOPE' } as const;

test.describe('with the Web Share API', () => {
	test.beforeEach(async ({ page }) => {
		await page.addInitScript(() => {
			const sent: ShareData[] = [];
			Object.assign(window, { sharedData: sent });
			navigator.share = async (data?: ShareData) => {
				sent.push(data ?? {});
			};
		});
	});

	test('shares the summary with the verdict, the notice and a link that reopens the inputs', async ({
		page,
		baseURL
	}) => {
		await openDemo(page);
		const demoLambda = await readLoadFactor(page);
		await typeInto(page, 'loads[2].value', '9,5');
		// A smaller hoist load: λ on it rises.
		await expect.poll(() => readLoadFactor(page)).toBeGreaterThan(demoLambda);
		const lambda = await page.getByTestId('load-factor').textContent();
		const verdict = (await page
			.getByTestId('verdict')
			.getAttribute('data-verdict')) as keyof typeof WORDS;
		await page.getByTestId('share-summary').click();
		await expect(page.getByTestId('share-status')).toHaveText('Shared.');
		const [sent] = await page.evaluate(
			() => (window as unknown as { sharedData: ShareData[] }).sharedData
		);
		expect(sent.text).toContain(WORDS[verdict]);
		expect(sent.text).toContain(ENGINEER_NOTICE_SHORT);
		expect(sent.url).toMatch(new RegExp(`^${baseURL}/check#c=`));

		// Change the form, leave, then follow the link: the shared inputs come back, not the draft.
		await typeInto(page, 'loads[2].value', '3');
		await page.waitForTimeout(400);
		await page.goto('/');
		await openCheck(page, sent.url!);
		await expect(fieldAt(page, 'loads[2].value')).toHaveValue('9.5');
		await expect(fieldAt(page, 'beam.spans[0]')).toHaveValue('4.8');
		await expect(page.getByTestId('load-factor')).toHaveText(lambda ?? '');
	});

	test('shares the long form too', async ({ page }) => {
		await openDemo(page);
		await readLoadFactor(page);
		await page.getByTestId('share-long').click();
		const [sent] = await page.evaluate(
			() => (window as unknown as { sharedData: ShareData[] }).sharedData
		);
		expect(sent.text).toContain(ENGINEER_NOTICE_SHORT);
		// The long form lists every check, so it is longer than the short one.
		expect(sent.text!.length).toBeGreaterThan(600);
	});
});

test.describe('without the Web Share API', () => {
	test.use({ permissions: ['clipboard-read', 'clipboard-write'] });

	test('copies the summary and link to the clipboard and says so', async ({ page, baseURL }) => {
		await page.addInitScript(() => {
			Object.defineProperty(Navigator.prototype, 'share', { value: undefined, configurable: true });
		});
		await openDemo(page);
		await readLoadFactor(page);
		const verdict = (await page
			.getByTestId('verdict')
			.getAttribute('data-verdict')) as keyof typeof WORDS;
		await page.getByTestId('share-summary').click();
		await expect(page.getByTestId('share-status')).toContainText('copied to the clipboard');
		const copied = await page.evaluate(() => navigator.clipboard.readText());
		expect(copied).toContain(WORDS[verdict]);
		expect(copied).toContain(ENGINEER_NOTICE_SHORT);
		expect(copied).toMatch(new RegExp(`${baseURL}/check#c=\\S+$`));
	});
});

test('a damaged link is refused with a message and the form still works', async ({ page }) => {
	await openCheck(page, '/check#c=1.@@not-base64@@');
	await expect(page.getByTestId('session-message')).not.toBeEmpty();
	await expectBlankCheck(page);
});

test('a link with a hollow case shows a message instead of waiting forever', async ({ page }) => {
	const link = (value: unknown) =>
		`/check#c=1.${Buffer.from(JSON.stringify(value), 'utf8').toString('base64url')}`;
	const pageErrors: string[] = [];
	page.on('pageerror', (error) => pageErrors.push(error.message));
	await openCheck(page, link({ v: 1, B: {}, l: [] }));
	await expect(page.getByTestId('session-message')).toHaveText(
		'This link does not hold a complete check (beam.spans: missing), so it was not opened. Ask for the link again.'
	);
	// The form falls back to a new blank check that says what to enter, and the screen never broke.
	await expectBlankCheck(page);
	// Only the fragment differs: leave first, or the browser treats it as a jump within the page.
	await page.goto('/');
	await openCheck(page, link({ B: {} }));
	await expect(page.getByTestId('session-message')).toContainText('damaged or cut short');
	await expectBlankCheck(page);
	expect(pageErrors).toEqual([]);
});
