/**
 * Empty fields: a cleared field holds no value (never the last one typed), the root radius may
 * stay empty, the engine's issue on an empty field reads "Not entered yet.", and whole-beam loads
 * still follow a span that was cleared and typed again.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { CheckForm } from '../../../src/lib/ui/state/check-form.svelte';
import { createBlankCase, createDemoCase } from '../../../src/lib/ui/state/demo-case';
import { BLANK_MESSAGE } from '../../../src/lib/ui/state/form-messages';
import { createLoad } from '../../../src/routes/check/load-kinds';

function makeForm() {
	return new CheckForm({ run: () => ({ state: 'error', message: 'stub engine' }), delay: 200 });
}

describe('blank fields', () => {
	beforeEach(() => vi.useFakeTimers());
	afterEach(() => vi.useRealTimers());

	it('a new check and a new load start with no size, position, span or action', () => {
		expect(createBlankCase().beam.spans).toEqual([null]);
		expect(createLoad('point', 6)).toEqual({ kind: 'point', x: null, value: null, action: null });
		expect(createLoad('whole', 6)).toEqual({
			kind: 'uniform',
			from: 0,
			to: 6,
			value: null,
			action: null
		});
	});

	it('a cleared field holds null and shows empty; a cleared root radius drops out of the case', () => {
		const form = makeForm();
		form.load(createDemoCase());
		form.setText('loads[2].value', '');
		expect(form.case.loads[2]).toMatchObject({ value: null });
		expect(form.local).toEqual({});
		form.update(
			(c) => (c.beam.section = { shape: 'I', h: 257.2, b: 146.1, tw: 6.1, tf: 8.6, r: 7.6 })
		);
		form.setText('beam.section.r', ' ');
		expect(
			'r' in form.case.beam.section && (form.case.beam.section as { r?: number }).r
		).toBeUndefined();
	});

	it('names an empty field as not entered, first in the list to fix', () => {
		const form = makeForm();
		form.load(createBlankCase());
		form.outcome = {
			state: 'issues',
			issues: [
				{
					path: 'beam.spans[0]',
					code: 'not-a-number',
					message: 'The span (m) must be a number.',
					severity: 'error'
				}
			]
		};
		expect(form.messages['beam.spans[0]']).toBe(BLANK_MESSAGE);
		expect(form.problems).toEqual([{ path: 'beam.spans[0]', message: BLANK_MESSAGE }]);
		form.setText('beam.spans[0]', '5x');
		expect(form.problems[0]).toMatchObject({
			path: 'beam.spans[0]',
			message: expect.stringMatching(/not a number/)
		});
	});

	it('whole-beam loads follow a span cleared and typed again', () => {
		const form = makeForm();
		form.load(createDemoCase());
		form.setText('beam.spans[0]', '');
		form.setText('beam.spans[0]', '6');
		expect(form.case.loads[0]).toMatchObject({ from: 0, to: 6 });
	});
});
