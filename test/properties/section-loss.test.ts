/**
 * Monotonicity: more section loss never increases a cross-section property, and a zero loss
 * changes nothing (common engineering sense; corrosion only removes steel). Also: a loss either
 * resolves to finite properties or is refused with an issue, never a NaN.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { listSections, resolveSection } from '../../src/lib/engine/section/index';
import type { SectionProps } from '../../src/lib/engine/section/index';

const MONOTONE: (keyof SectionProps)[] = [
	'A',
	'mass',
	'Iy',
	'Iz',
	'Wely',
	'Wply',
	'Welz',
	'Wplz',
	'It',
	'Iw',
	'Avz'
];
const designations = listSections().map((s) => s.designation);

function propsAt(designation: string, loss: number): SectionProps | null {
	const r = resolveSection({ designation }, { loss });
	return r.ok ? r.value.props : null;
}

describe('section loss', () => {
	it('never increases a property as the loss grows', () => {
		fc.assert(
			fc.property(
				fc.constantFrom(...designations),
				fc.double({ min: 0, max: 3, noNaN: true }),
				fc.double({ min: 0, max: 3, noNaN: true }),
				(designation, a, b) => {
					const [small, large] = a <= b ? [a, b] : [b, a];
					const lessLost = propsAt(designation, small);
					const moreLost = propsAt(designation, large);
					if (!moreLost) return; // refused: the element is consumed
					expect(lessLost).not.toBeNull();
					for (const key of MONOTONE)
						expect(moreLost[key]).toBeLessThanOrEqual(lessLost![key] * (1 + 1e-12));
				}
			),
			{ numRuns: 300 }
		);
	});

	it('a loss leaving a round-off sliver of wall is refused, not NaN (found by this property)', () => {
		expect(propsAt('CF SHS 60x60x3.0', 2.9999999999999982)).toBeNull();
		expect(propsAt('CF SHS 60x60x3.0', 2.6)).toBeNull(); // 0.4 mm left: below what a gauge reads
		expect(propsAt('CF SHS 60x60x3.0', 2.4)).not.toBeNull();
	});

	it('a zero loss gives the library properties exactly', () => {
		for (const s of listSections()) expect(propsAt(s.designation, 0)).toEqual(s.props);
	});

	it('any loss gives finite properties or an issue, never NaN', () => {
		fc.assert(
			fc.property(
				fc.constantFrom(...designations),
				fc.double({ min: 0, max: 40, noNaN: true }),
				(designation, loss) => {
					const r = resolveSection({ designation }, { loss });
					if (!r.ok) {
						expect(r.issues.length).toBeGreaterThan(0);
						return;
					}
					for (const v of Object.values(r.value.props!)) expect(Number.isFinite(v)).toBe(true);
				}
			)
		);
	});
});
