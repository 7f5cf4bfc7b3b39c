/**
 * Partial factors and combinations of actions, EN 1990 6.4.3.2 and Annex A1 Table A1.2(B)
 * (STR, recommended values). The temporary action is the load being checked; existing imposed
 * load on the beam is a second variable action. Each variable action leads in turn.
 */
import type { FactorSetName, FactorSettings, Combination } from '../basis-types';
export type { FactorSetName, FactorSettings, Combination } from '../basis-types';

/** Factors resolved from settings, with the combinations to try. */
export interface ResolvedFactors {
	set: FactorSetName;
	gammaGsup: number;
	gammaGinf: number;
	gammaQ: number;
	gammaT: number;
	xi: number;
	psi0: number;
	psi0T: number;
	gammaM0: number;
	gammaM1: number;
	combinations: Combination[];
}

/** EN 1990 Table A1.2(B) recommended values; EN 1993-1-1 6.1 NOTE 2B for γM0, γM1. */
export const RECOMMENDED_FACTORS = {
	gammaGsup: 1.35,
	gammaGinf: 1.0,
	gammaQ: 1.5,
	xi: 0.85,
	psi0: 0.7,
	// EN 1991-1-6 Annex A1 Table A1.1: ψ0 = 1.0 for construction loads (recommended value).
	psi0T: 1.0,
	gammaM0: 1.0,
	gammaM1: 1.0
} as const;

/**
 * Resolves the factor set into the combination expressions to try; the worst one governs.
 * With existing imposed load present, 6.10 and 6.10b are written twice, once with each variable
 * action leading (EN 1990 6.4.3.2(3)); 6.10a applies ψ0 to both.
 * @example
 * resolveFactors({ set: 'en1990-6.10' }, { hasImposed: false }).combinations[0].gammaTemporary
 * // 1.5
 */
export function resolveFactors(
	settings: FactorSettings,
	options: { hasImposed: boolean }
): ResolvedFactors {
	const r = RECOMMENDED_FACTORS;
	const gammaQ = settings.gammaQ ?? r.gammaQ;
	const psi0 = settings.psi0 ?? r.psi0;
	const f = {
		set: settings.set,
		gammaGsup: settings.gammaGsup ?? r.gammaGsup,
		gammaGinf: settings.gammaGinf ?? r.gammaGinf,
		gammaQ,
		gammaT: settings.gammaT ?? gammaQ,
		xi: settings.xi ?? r.xi,
		psi0,
		psi0T: settings.psi0T ?? r.psi0T,
		gammaM0: settings.gammaM0 ?? r.gammaM0,
		gammaM1: settings.gammaM1 ?? r.gammaM1
	};
	return { ...f, combinations: listCombinations(f, options.hasImposed) };
}

function listCombinations(f: Omit<ResolvedFactors, 'combinations'>, hasImposed: boolean) {
	const g = (sup: number) => ({ gammaGsup: sup, gammaGinf: f.gammaGinf });
	const leadT = (name: string, sup: number): Combination => ({
		name: hasImposed ? `${name}, temporary leading` : name,
		...g(sup),
		gammaImposed: f.gammaQ * f.psi0,
		gammaTemporary: f.gammaT
	});
	const leadQ = (name: string, sup: number): Combination => ({
		name: `${name}, imposed leading`,
		...g(sup),
		gammaImposed: f.gammaQ,
		gammaTemporary: f.gammaT * f.psi0T
	});
	if (f.set === 'custom') {
		const custom = { gammaImposed: f.gammaQ, gammaTemporary: f.gammaT };
		return [{ name: 'custom', ...g(f.gammaGsup), ...custom }];
	}
	const out: Combination[] = [];
	if (f.set === 'en1990-6.10') {
		out.push(leadT('6.10', f.gammaGsup));
		if (hasImposed) out.push(leadQ('6.10', f.gammaGsup));
		return out;
	}
	out.push({
		name: '6.10a',
		...g(f.gammaGsup),
		gammaImposed: f.gammaQ * f.psi0,
		gammaTemporary: f.gammaT * f.psi0T
	});
	out.push(leadT('6.10b', f.xi * f.gammaGsup));
	if (hasImposed) out.push(leadQ('6.10b', f.xi * f.gammaGsup));
	return out;
}
