import type { FactorSet, Settings } from '$lib/storage';
import type { CaseFile } from './case-file';
import { factorsForBasis } from './design-basis';
import { basisGrade } from './usual-grade';

/**
 * The factors a case takes from a factor set: the combination rule by the engine's set name, and
 * every number of the set (the engine uses given numbers over its recommended ones).
 * @example
 * factorsFromSet(BUILT_IN_FACTOR_SETS[0]).permanent // 1.35
 */
export function factorsFromSet(set: FactorSet): NonNullable<CaseFile['factors']> {
	return {
		set: set.combination === '6.10a/b' ? 'en1990-6.10ab' : 'en1990-6.10',
		permanent: set.gammaG,
		permanentFavourable: set.gammaGinf,
		imposed: set.gammaQ,
		temporary: set.gammaTemp,
		gammaM0: set.gammaM0,
		gammaM1: set.gammaM1,
		xi: set.xi,
		psi0: set.psi0
	};
}

/**
 * A new case with the user's defaults from settings: design basis with its usual grade, factor
 * set, lateral restraint, deflection limit. Does not mutate its argument.
 * @example
 * applySettingsDefaults(createBlankCase(), settings, set).deflectionLimit // 200
 */
export function applySettingsDefaults(c: CaseFile, settings: Settings, set: FactorSet): CaseFile {
	return {
		...c,
		// Top-flange loading is the cautious assumption for lateral-torsional buckling.
		// The basis's usual grade until a section says otherwise (A992 on AISC, S275 on Eurocode).
		beam: {
			...c.beam,
			grade: basisGrade(settings.defaultBasis, undefined),
			restraint: { lateral: settings.defaultRestraint, loadHeight: 'top-flange' }
		},
		basis: settings.defaultBasis,
		// Factors of one code mean nothing in another: an AISC check takes ASCE 7-22's.
		factors:
			settings.defaultBasis === 'eurocode'
				? factorsFromSet(set)
				: factorsForBasis(settings.defaultBasis, set),
		deflectionLimit: settings.deflectionLimit
	};
}
