import type { FactorSet, Settings } from '$lib/storage';
import type { CaseFile } from './case-file';

/**
 * The factors a case takes from a factor set: built-in sets by their id (the engine knows them),
 * own sets as `custom` with their numbers.
 * @example
 * factorsFromSet(BUILT_IN_FACTOR_SETS[0]).permanent // 1.35
 */
export function factorsFromSet(set: FactorSet): NonNullable<CaseFile['factors']> {
	return {
		set: set.id.startsWith('en1990-') ? set.id : 'custom',
		permanent: set.gammaG,
		imposed: set.gammaQ,
		temporary: set.gammaTemp,
		gammaM0: set.gammaM0,
		gammaM1: set.gammaM1
	};
}

/**
 * A new case with the user's defaults from settings: factor set, lateral restraint, deflection
 * limit. Does not mutate its argument.
 * @example
 * applySettingsDefaults(createBlankCase(), settings, set).deflectionLimit // 200
 */
export function applySettingsDefaults(c: CaseFile, settings: Settings, set: FactorSet): CaseFile {
	return {
		...c,
		beam: { ...c.beam, restraint: { lateral: settings.defaultRestraint, loadHeight: c.beam.restraint?.loadHeight ?? 'top-flange' } },
		factors: factorsFromSet(set),
		deflectionLimit: settings.deflectionLimit
	};
}
