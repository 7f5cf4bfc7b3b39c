/**
 * The form's state: the engine runs once per quiet period (never per keystroke), typing problems
 * block it, a units switch changes what is shown and never the case, and list edits keep the
 * typed texts with their loads. US factor: ft = 0.3048 m exactly (NIST SP 811, Appendix B).
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { CheckForm } from '../../../src/lib/ui/state/check-form.svelte';
import type { CaseFile } from '../../../src/lib/ui/state/case-file';
import type { CheckOutcome } from '../../../src/lib/ui/state/check-outcome';
import { createDemoCase } from '../../../src/lib/ui/state/demo-case';

function makeForm() {
	const seen: CaseFile[] = [];
	const form = new CheckForm({
		run: (c) => {
			seen.push(c);
			return { state: 'error', message: 'stub engine' };
		},
		delay: 200
	});
	form.load(createDemoCase());
	seen.length = 0;
	return { form, seen };
}

describe('CheckForm', () => {
	beforeEach(() => vi.useFakeTimers());
	afterEach(() => vi.useRealTimers());

	it('runs the engine once after a burst of keystrokes, with the last value', () => {
		const { form, seen } = makeForm();
		for (const text of ['5', '5,', '5,2', '5,25']) form.setText('beam.spans[0]', text);
		expect(seen).toHaveLength(0);
		vi.advanceTimersByTime(200);
		expect(seen).toHaveLength(1);
		expect(seen[0].beam.spans[0]).toBe(5.25);
	});

	it('does not run while a field holds something that is not a number', () => {
		const { form, seen } = makeForm();
		form.setText('loads[0].value', '3,2kN');
		vi.advanceTimersByTime(1000);
		expect(seen).toHaveLength(0);
		expect(form.outcome).toBeNull();
		expect(form.messages['loads[0].value']).toMatch(/not a number/);
		// The case keeps the last good value.
		expect(form.case.loads[0]).toMatchObject({ value: 3.2 });
	});

	it('shows feet after a units switch without changing the case', () => {
		const { form } = makeForm();
		const before = JSON.stringify(form.case);
		form.setUnits('US');
		expect(form.text('beam.spans[0]')).toBe(String(Math.round((4.8 / 0.3048) * 1e4) / 1e4));
		form.setUnits('SI');
		expect(JSON.stringify(form.case)).toBe(before);
		expect(form.text('beam.spans[0]')).toBe('4.8');
	});

	it('runs a result already shown again when the units change (its words follow them)', async () => {
		const asked: string[] = [];
		const form: CheckForm = new CheckForm({
			run: (): CheckOutcome => {
				asked.push(form.units);
				return { state: 'error', message: `words in ${form.units}` };
			}
		});
		form.load(createDemoCase());
		await vi.runAllTimersAsync();
		expect(asked).toEqual(['SI']);
		form.setUnits('US');
		await vi.runAllTimersAsync();
		expect(asked).toEqual(['SI', 'US']);
		expect(form.outcome).toEqual({ state: 'error', message: 'words in US' });
		// The same units again is no change and runs nothing.
		form.setUnits('US');
		await vi.runAllTimersAsync();
		expect(asked).toHaveLength(2);
	});

	it('runs nothing on a units switch before any result was asked for', () => {
		const seen: string[] = [];
		const form = new CheckForm({ run: () => (seen.push('run'), null) });
		form.setUnits('US');
		expect(seen).toHaveLength(0);
	});

	it('keeps a typed text with its load when an earlier load is removed', () => {
		const { form } = makeForm();
		form.setText('loads[2].x', '2,5');
		form.removeLoad(0);
		expect(form.text('loads[1].x')).toBe('2,5');
		expect(form.case.loads).toHaveLength(2);
	});

	it('stretches a whole-beam load when the span changes', () => {
		const { form } = makeForm();
		form.setText('beam.spans[0]', '6');
		expect(form.case.loads[0]).toMatchObject({ kind: 'uniform', from: 0, to: 6 });
		// The point load is not moved.
		expect(form.case.loads[2]).toMatchObject({ kind: 'point', x: 2.1 });
	});

	it('shows a message instead of waiting forever when the engine call fails', async () => {
		const throwing = new CheckForm({
			run: () => {
				throw new Error('no engine here');
			}
		});
		throwing.load(createDemoCase());
		await vi.advanceTimersByTimeAsync(0);
		expect(throwing.outcome).toEqual({ state: 'error', message: 'no engine here' });
		expect(throwing.pending).toBe(false);
		const rejecting = new CheckForm({ run: () => Promise.reject(new Error('worker gone')) });
		rejecting.load(createDemoCase());
		await vi.advanceTimersByTimeAsync(0);
		expect(rejecting.outcome).toEqual({ state: 'error', message: 'worker gone' });
		expect(rejecting.pending).toBe(false);
	});
});
