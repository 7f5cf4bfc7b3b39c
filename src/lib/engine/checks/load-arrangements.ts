/**
 * Load arrangements (EN 1990 6.4.3.2 and A1.3.1): existing imposed load is patterned span by
 * span, present where unfavourable and absent where favourable; permanent load takes its upper
 * or lower factor over the whole beam (single-source rule). To be exact without knowing which
 * spans are unfavourable for which check, every pattern is listed and the worst one governs.
 */
import type { Combination } from './basis-types';

/** Most spans (overhangs included) whose imposed load is patterned: 2^6 × 2 arrangements. */
export const MAX_PATTERNED_SPANS = 6;

/** Factors applied to each action category in one arrangement. */
export interface LoadArrangement {
	/** Plain-text name, e.g. `6.10, G sup, imposed on spans 1, 3`. */
	name: string;
	combination: string;
	permanent: 'sup' | 'inf';
	/** Factor on every permanent load. */
	gammaG: number;
	/** Factor on existing imposed load in each span (0 where the pattern leaves it off). */
	imposedBySpan: number[];
	/** Factor on the temporary loads (they are always present). */
	gammaTemporary: number;
}

/** Options for {@link listLoadArrangements}. */
export interface LoadArrangementOptions {
	combinations: Combination[];
	/** Number of spans of the beam line, overhangs included. */
	spanCount: number;
	/** Indices of spans that carry existing imposed load; only these are patterned. */
	imposedSpans: number[];
}

/**
 * Lists every arrangement: per combination, 2 permanent factors × 2^k imposed patterns over the
 * k spans that carry imposed load. Throws when k exceeds {@link MAX_PATTERNED_SPANS}: input
 * validation must refuse such a case first.
 * @example
 * listLoadArrangements({ combinations: [c610], spanCount: 2, imposedSpans: [0, 1] }).length // 8
 */
export function listLoadArrangements(options: LoadArrangementOptions): LoadArrangement[] {
	const { combinations, spanCount, imposedSpans } = options;
	if (imposedSpans.length > MAX_PATTERNED_SPANS) {
		throw new Error(`invariant: at most ${MAX_PATTERNED_SPANS} patterned spans`);
	}
	const out: LoadArrangement[] = [];
	for (const c of combinations) {
		// ASCE 7 gravity combinations give dead load one factor: no favourable arrangement.
		const permanents = c.permanentSingle ? (['sup'] as const) : (['sup', 'inf'] as const);
		for (const permanent of permanents) {
			const gammaG = permanent === 'sup' ? c.gammaGsup : c.gammaGinf;
			// With no factor on imposed load every pattern is the same arrangement (1.4D).
			const patterns = c.gammaImposed === 0 ? 1 : 1 << imposedSpans.length;
			for (let mask = 0; mask < patterns; mask++) {
				const on = imposedSpans.filter((_, k) => mask & (1 << k));
				const imposedBySpan = Array.from({ length: spanCount }, (_, i) =>
					on.includes(i) ? c.gammaImposed : 0
				);
				out.push({
					name: nameArrangement(c, permanent, on, imposedSpans.length > 0),
					combination: c.name,
					permanent,
					gammaG,
					imposedBySpan,
					gammaTemporary: c.gammaTemporary
				});
			}
		}
	}
	return out;
}

function nameArrangement(
	c: Combination,
	permanent: 'sup' | 'inf',
	on: number[],
	hasImposed: boolean
): string {
	const g = c.permanentSingle
		? c.name
		: `${c.name}, permanent ${permanent === 'sup' ? 'upper' : 'lower'} factor`;
	const word = c.imposedWord ?? 'imposed';
	if (!hasImposed) return g;
	if (on.length === 0) return `${g}, no ${word} load`;
	return `${g}, ${word} on span${on.length > 1 ? 's' : ''} ${on.map((i) => i + 1).join(', ')}`;
}
