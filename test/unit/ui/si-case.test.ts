/**
 * A case written in US units opened on the form (which edits SI) is turned into its SI twin, so a
 * length in ft is never shown or saved as metres. Factors: NIST SP 811 Appendix B, 1 ft = 0.3048 m
 * and 1 kip = 4.448 221 615 260 5 kN (exact definitions).
 */
import { describe, expect, it } from 'vitest';
import { CheckForm } from '../../../src/lib/ui/state/check-form.svelte';
import type { CaseFile } from '../../../src/lib/ui/state/case-file';
import { toSiCase } from '../../../src/lib/ui/state/si-case';

const FT = 0.3048;
const KIP = 4.4482216152605;

const usCase = (): CaseFile => ({
	format: 'hingepoint.case',
	version: 1,
	basis: 'aisc-lrfd',
	units: 'us',
	beam: {
		spans: [20],
		supports: ['pin', 'pin'],
		section: { designation: 'W12x26' },
		grade: 'A992'
	},
	loads: [{ kind: 'point', x: 10, value: 2, action: 'temporary' }]
});

describe('a US-units case on the SI form', () => {
	it('is converted on the way in; the basis stays and the units field goes', () => {
		const form = new CheckForm({ run: () => ({ state: 'error', message: 'stub' }), delay: 200 });
		form.load(usCase());
		expect(form.case.units).toBeUndefined();
		expect(form.case.basis).toBe('aisc-lrfd');
		expect(Math.abs(form.case.beam.spans[0] / (20 * FT) - 1)).toBeLessThan(1e-12);
		const load = form.case.loads[0];
		expect(load.kind === 'point' && Math.abs(load.value / (2 * KIP) - 1)).toBeLessThan(1e-12);
	});

	it('leaves an SI case untouched (the same object)', () => {
		const si = { ...usCase(), units: 'si' as const };
		expect(toSiCase(si)).toBe(si);
		const plain: CaseFile = { ...usCase() };
		delete plain.units;
		expect(toSiCase(plain)).toBe(plain);
	});
});
