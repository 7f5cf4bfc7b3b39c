/**
 * Quick templates for common temporary loads. TYPICAL DEMO VALUES ONLY — invented, rounded
 * figures to start from; a real check uses the rated load and self weight of the actual equipment.
 */

/** One editable template: a base load (kN) times a factor gives the point load added. */
export interface LoadTemplate {
	id: string;
	label: string;
	/** What the base value stands for. */
	baseLabel: string;
	/** Base characteristic load, kN (demo value). */
	base: number;
	/** Label of the multiplier; null when the template has none. */
	factorLabel: string | null;
	/** Multiplier on the base load (demo value). */
	factor: number;
	/** True for equipment that may hang below the beam: the user says where it hangs. */
	hangs?: boolean;
}

/** Demo templates (common practice, invented rounded values; never design values). */
export const LOAD_TEMPLATES: readonly LoadTemplate[] = [
	{
		id: 'chain-hoist',
		label: 'Chain hoist, 1 t, on a beam trolley',
		baseLabel: 'Rated load + hoist + trolley',
		base: 10.1,
		factorLabel: 'Dynamic factor',
		factor: 1.25,
		hangs: true
	},
	{
		id: 'pallets',
		label: 'Stacked pallets of board',
		baseLabel: 'One pallet',
		base: 15,
		factorLabel: 'Pallets stacked',
		factor: 1
	},
	{
		id: 'prop',
		label: 'Temporary prop or scaffold standard',
		baseLabel: 'Load down the prop',
		base: 6,
		factorLabel: null,
		factor: 1
	}
];

/**
 * The point load a template adds, kN.
 * @example
 * templateLoad({ base: 10.1, factor: 1.25 }) // 12.625
 */
export function templateLoad(template: Pick<LoadTemplate, 'base' | 'factor'>): number {
	return template.base * template.factor;
}
