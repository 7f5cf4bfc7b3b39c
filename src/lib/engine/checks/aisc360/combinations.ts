/**
 * Load combinations of the AISC bases, ASCE 7-22 §2.3.1 (strength design, LRFD) and §2.4.1
 * (allowable stress design, ASD), gravity only (from memory of the clause numbers and factors;
 * engineering reference C.4 and C.7):
 * LRFD 1.4D and 1.2D + 1.6L; ASD D and D + L. The proposed temporary load is taken as live load
 * (factor 1.6 on LRFD, 1.0 on ASD) unless the settings give it its own factor: ASCE 37 covers
 * loads during construction, but its factors are not confirmed here. 0.9D belongs to the wind and
 * seismic combinations (2.3.1 (6), (7)), which do not apply to a gravity-only beam, so dead load
 * takes one factor over the whole beam. Existing live load is patterned span by span as on the
 * Eurocode basis (load-arrangements.ts).
 */
import type { Combination, FactorSettings } from '../basis-types';
import type { AiscMethod } from './resistance';

/** Recommended factors per method. */
export const ASCE7_FACTORS = {
	lrfd: { alone: 1.4, dead: 1.2, live: 1.6 },
	asd: { alone: 1.0, dead: 1.0, live: 1.0 }
} as const;

/** The factors in use, named as in the Specification's load symbols. */
export interface AsceFactors {
	/** Name of the set: `asce7-lrfd`, `asce7-asd` or `custom`. */
	set: string;
	/** Dead load alone (1.4D / D). */
	alone: number;
	/** Dead load with live load (1.2D / D). */
	dead: number;
	/** Existing live load (1.6L / L). */
	live: number;
	/** Proposed temporary load (as live load unless set). */
	temporary: number;
}

/** True when the settings were written for these bases (otherwise the recommended set is used). */
function ownSet(settings: FactorSettings): boolean {
	return settings.set === 'asce7-lrfd' || settings.set === 'asce7-asd' || settings.set === 'custom';
}

/**
 * The factors for a method: entered values of an ASCE 7 or custom set, recommended values for
 * whatever is missing. A Eurocode set name means nothing here: its numbers are not used.
 * @example resolveAsceFactors({ set: 'asce7-lrfd' }, 'lrfd').temporary // 1.6
 */
export function resolveAsceFactors(settings: FactorSettings, method: AiscMethod): AsceFactors {
	const r = ASCE7_FACTORS[method];
	const own = ownSet(settings);
	const pick = (v: number | undefined, fallback: number) => (own && v !== undefined ? v : fallback);
	const live = pick(settings.gammaQ, r.live);
	return {
		set: own ? settings.set : method === 'lrfd' ? 'asce7-lrfd' : 'asce7-asd',
		alone: pick(settings.gammaGAlone, r.alone),
		dead: pick(settings.gammaGsup, r.dead),
		live,
		temporary: pick(settings.gammaT, live)
	};
}

/** A factor as written in a combination: `1.2`, and nothing for 1 (`D + L`). */
function coefficient(v: number): string {
	return v === 1 ? '' : String(Number(v.toPrecision(4)));
}

/**
 * The combinations to try: dead load alone, and dead with live and the temporary load.
 * @example listAsceCombinations(resolveAsceFactors({ set: 'asce7-lrfd' }, 'lrfd'), 'lrfd')
 *   .map((c) => c.name) // ['1.4D (ASCE 7-22 2.3.1)', '1.2D + 1.6L (ASCE 7-22 2.3.1), …']
 */
export function listAsceCombinations(f: AsceFactors, method: AiscMethod): Combination[] {
	const clause = method === 'lrfd' ? 'ASCE 7-22 2.3.1' : 'ASCE 7-22 2.4.1';
	const single = { permanentSingle: true, imposedWord: 'live' };
	const alone: Combination = {
		name: `${coefficient(f.alone)}D (${clause})`,
		gammaGsup: f.alone,
		gammaGinf: f.alone,
		gammaImposed: 0,
		gammaTemporary: 0,
		...single
	};
	const temporary =
		f.temporary === f.live
			? 'temporary load as live load'
			: `temporary load × ${Number(f.temporary.toPrecision(4))}`;
	const withLive: Combination = {
		name: `${coefficient(f.dead)}D + ${coefficient(f.live)}L (${clause}), ${temporary}`,
		gammaGsup: f.dead,
		gammaGinf: f.dead,
		gammaImposed: f.live,
		gammaTemporary: f.temporary,
		...single
	};
	return [alone, withLive];
}
