/**
 * Deflection limits reported on the AISC basis: span/360 under live load and span/240 under
 * total load. Common practice in the US (the IBC Table 1604.3 values for floor members, from
 * memory); AISC 360-22 itself sets no limit (Chapter L leaves serviceability to the engineer).
 * Reported, not decisive, unless the user makes them decide.
 */

/** One limit: δ ≤ span / ratio. */
export interface DeflectionLimit {
	load: 'live' | 'total';
	/** The divisor: 360 or 240. */
	ratio: number;
	/** The limit for this span, mm. */
	limit: number;
	source: string;
}

const SOURCE = 'common practice (IBC Table 1604.3, from memory)';

/**
 * span/360 (live) and span/240 (total). For a cantilever the caller passes twice its length
 * (IBC Table 1604.3 footnote, from memory).
 * @param span mm
 * @example computeDeflectionLimits(6096)[0].limit // 16.93 mm (20 ft / 360)
 */
export function computeDeflectionLimits(span: number): DeflectionLimit[] {
	return [
		{ load: 'live', ratio: 360, limit: span / 360, source: SOURCE },
		{ load: 'total', ratio: 240, limit: span / 240, source: SOURCE }
	];
}
