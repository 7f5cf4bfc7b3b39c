/** The save button's reason: the first field to fix in the screen's words, or a missing answer. */
import { describe, expect, it } from 'vitest';
import { findSaveBlock } from '../../../src/lib/ui/state/save-block';
import type { CheckOutcome } from '../../../src/lib/ui/state/check-outcome';

const REPORT = { state: 'report', report: {}, warnings: [] } as unknown as CheckOutcome;

describe('findSaveBlock', () => {
	it('names the first field to fix and leads to it', () => {
		const problems = [
			{ path: 'loads[1].x', message: 'Not entered yet.' },
			{ path: 'beam.spans[0]', message: 'Not entered yet.' }
		];
		expect(findSaveBlock(problems, null)).toEqual({
			reason: 'Fix Load 2 — position from left end first',
			path: 'loads[1].x'
		});
	});

	it('refuses a check the engine could not answer, or has not answered yet', () => {
		expect(findSaveBlock([], { state: 'error', message: 'x' })?.path).toBeNull();
		expect(findSaveBlock([], null)?.reason).toMatch(/still being worked out/);
	});

	it('lets a check with a result be saved', () => {
		expect(findSaveBlock([], REPORT)).toBeNull();
	});
});
