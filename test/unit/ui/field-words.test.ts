/**
 * Messages name fields as the screen does (labels in src/routes/check/*.svelte, 1-based load and
 * span numbers, supports lettered A, B … from the left as in the drawings), never by path.
 */
import { describe, expect, it } from 'vitest';
import { describeFieldPath } from '../../../src/lib/ui/state/field-words';

describe('describeFieldPath', () => {
	it('numbers loads and spans from 1, as the screen does', () => {
		expect(describeFieldPath('loads[1].x')).toBe('Load 2 — position from left end');
		expect(describeFieldPath('loads[0].value')).toBe('Load 1 — size');
		expect(describeFieldPath('beam.spans[2]')).toBe('Span 3 — length');
	});

	it('letters supports from A at the left end, joints by their support', () => {
		expect(describeFieldPath('beam.supports[0]')).toBe('Support A');
		expect(describeFieldPath('beam.joints[0]')).toBe('Joint at support B');
		expect(describeFieldPath('beam.bearing[1]')).toBe('Stiff bearing at support B');
	});

	it('uses the section and factor labels of the form', () => {
		expect(describeFieldPath('beam.section.tf')).toBe('Section — flange thickness tf');
		expect(describeFieldPath('factors.temporary')).toBe('Factors — γ proposed temporary');
		expect(describeFieldPath('beam.grade.fy')).toBe('Steel grade — yield strength fy');
	});

	it('never shows an internal path, even for a field it does not know', () => {
		for (const path of ['case.unknown[3].thing', 'beam.weird', 'loads[9].zzz']) {
			expect(describeFieldPath(path)).not.toMatch(/\[\d+\]|\w\.\w/);
		}
	});
});
