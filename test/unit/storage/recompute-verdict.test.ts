// The verdict the list shows comes from the app's own engine, whatever a stored report claims.
import { describe, expect, it } from 'vitest';
import { recomputeVerdict } from '../../../src/lib/ui/state/recompute-verdict';
import { readVerdict } from '../../../src/lib/ui/state/verdict-stamp';
import overloaded from '../../fixtures/cases/demo-overloaded.json';
import hoist from '../../fixtures/cases/demo-hoist-on-ub.json';
import invalid from '../../fixtures/cases/invalid-fields.json';

describe('recomputeVerdict', () => {
	it('works the verdict out from the inputs: the overloaded demo fails, the hoist demo passes', () => {
		expect(recomputeVerdict(overloaded)).toBe('fail');
		expect(recomputeVerdict(hoist)).toBe('pass');
	});

	it('gives no verdict for inputs that fail validation or are not a case at all', () => {
		expect(recomputeVerdict(invalid)).toBe('needs-attention');
		expect(recomputeVerdict({ format: 'hingepoint.case', version: 1, beam: {}, loads: [] })).toBe(
			'needs-attention'
		);
		expect(recomputeVerdict(null)).toBe('needs-attention');
	});

	it('says "no-load" for a valid beam with no proposed load', () => {
		const noLoad = { ...hoist, loads: hoist.loads.filter((l) => l.action !== 'temporary') };
		expect(recomputeVerdict(noLoad)).toBe('no-load');
	});

	it('reads the verdict where the report keeps it', () => {
		expect(readVerdict({ answer: { verdict: 'fail' } })).toBe('fail');
		expect(readVerdict({ verdict: 'pass' })).toBe('pass');
	});
});

describe('stampReport', () => {
	it('stamps a saved check with the verdict of its own report and this engine version', async () => {
		const { stampReport } = await import('../../../src/lib/ui/state/verdict-stamp');
		const { ENGINE_VERSION } = await import('../../../src/lib/engine');
		expect(stampReport({ answer: { verdict: 'fail' } })).toEqual({
			verdict: 'fail',
			computedBy: ENGINE_VERSION
		});
		expect(stampReport({ answer: { verdict: null } }).verdict).toBe('no-load');
		expect(stampReport({ answer: { verdict: 'maybe' } }).verdict).toBe('needs-attention');
	});
});
