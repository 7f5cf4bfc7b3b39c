/**
 * The answer is shown as soon as it is in; the governing curve (one design run per position)
 * follows and replaces the report only while the case is still the one it was asked for.
 */
import { describe, expect, it } from 'vitest';
import { CheckForm } from '../../../src/lib/ui/state/check-form.svelte';
import type { CheckOutcome, ReportView } from '../../../src/lib/ui/state/check-outcome';
import { createDemoCase } from '../../../src/lib/ui/state/demo-case';

const report = (tag: string) =>
	({ state: 'report', report: { engineVersion: tag } as ReportView, warnings: [] }) as CheckOutcome;

function deferred() {
	let resolve!: (o: CheckOutcome) => void;
	const promise = new Promise<CheckOutcome>((r) => (resolve = r));
	return { promise, resolve };
}

describe('CheckForm: answer first, curve after', () => {
	it('shows the answer, then the report with the curve for the same case', async () => {
		const curve = deferred();
		const form = new CheckForm({ run: () => report('answer'), runCurve: () => curve.promise });
		form.load(createDemoCase());
		await form.runNow();
		expect(form.outcome?.state === 'report' && form.outcome.report.engineVersion).toBe('answer');
		curve.resolve(report('with curve'));
		await curve.promise;
		await Promise.resolve();
		expect(form.outcome?.state === 'report' && form.outcome.report.engineVersion).toBe(
			'with curve'
		);
	});

	it('drops a curve that arrives after the case changed', async () => {
		const curve = deferred();
		const form = new CheckForm({
			run: () => report('answer'),
			runCurve: () => curve.promise,
			delay: 10_000
		});
		form.load(createDemoCase());
		await form.runNow();
		form.setText('beam.spans[0]', '5');
		curve.resolve(report('stale curve'));
		await curve.promise;
		await Promise.resolve();
		expect(form.outcome?.state === 'report' && form.outcome.report.engineVersion).toBe('answer');
		form.dispose();
	});
});
