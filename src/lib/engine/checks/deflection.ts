/**
 * Deflection under unfactored loads, compared with span/limit. The limit is a setting: the
 * default span/200 for the temporary load is common practice, not a code value (a UK National
 * Annex suggests span/200 for beams under variable load, from memory). A cantilever of length c
 * is compared as a span of 2c (common practice).
 */

/** Default span/δ limit for the temporary load (common practice). */
export const DEFAULT_DEFLECTION_LIMIT = 200;

/** Inputs of {@link checkDeflection}; mm. */
export interface DeflectionCheckInput {
	/** Largest deflection in the span, mm (sign ignored). */
	deflection: number;
	/** Span length, mm; for a cantilever its length. */
	span: number;
	cantilever: boolean;
	/** Limit as span/limit, e.g. 200. */
	limit: number;
}

/** Deflection against its limit. */
export interface DeflectionCheck {
	deflection: number;
	/** Allowed deflection, mm. */
	allowed: number;
	/** span/δ as a number (Infinity is never returned: 0 deflection gives null). */
	spanOverDeflection: number | null;
	utilisation: number;
}

/**
 * Compares a deflection with span/limit.
 * @example
 * checkDeflection({ deflection: 16.47, span: 6000, cantilever: false, limit: 200 }).utilisation
 * // ≈ 0.549
 */
export function checkDeflection(o: DeflectionCheckInput): DeflectionCheck {
	const effectiveSpan = o.cantilever ? 2 * o.span : o.span;
	const allowed = effectiveSpan / o.limit;
	const d = Math.abs(o.deflection);
	return {
		deflection: d,
		allowed,
		spanOverDeflection: d > 0 ? effectiveSpan / d : null,
		utilisation: d / allowed
	};
}
