/**
 * Builds the design-check input from a validated case model (internal units already).
 */
import type { CaseModel } from '../case/types';
import type { FactorSetName } from './basis-types';
import type { DesignCheckInput } from './inputs';
import type { LateralRestraint } from './restraint';

/**
 * Design-check input of a case. A case read from a file always has a restraint (parseCase
 * assumes the flange held at the supports only when none is given); the load height defaults
 * to the top flange, the destabilising (conservative) choice.
 */
export function buildDesignCheckInput(model: CaseModel): DesignCheckInput {
	const f = model.factors;
	const r = model.restraint;
	const restraint: LateralRestraint | null = !r
		? null
		: r.lateral === 'continuous'
			? { kind: 'continuous' }
			: r.lateral === 'ends-only'
				? { kind: 'ends-only' }
				: { kind: 'points', at: r.lateral };
	const given = model.bearing !== undefined || model.bearingLoads !== undefined;
	// ASCE 7 dead-load-only factor (AISC bases); the other names are shared with EN 1990.
	const alone = f.permanentAlone === undefined ? {} : { gammaGAlone: f.permanentAlone };
	return {
		beam: model.beam,
		sections: model.sections,
		grades: model.grades,
		loads: [...model.loads, ...model.selfWeightLoads],
		factors: {
			set: (f.set as FactorSetName | undefined) ?? 'en1990-6.10',
			gammaGsup: f.permanent,
			gammaGinf: f.permanentFavourable,
			gammaQ: f.imposed,
			gammaT: f.temporary,
			xi: f.xi,
			psi0: f.psi0,
			psi0T: f.psi0Temporary,
			gammaM0: f.gammaM0,
			gammaM1: f.gammaM1,
			...alone
		},
		restraint,
		loadHeight: r?.loadHeight ?? 'top-flange',
		bearing: given ? { supports: model.bearing ?? [], loads: model.bearingLoads ?? 0 } : null,
		deflectionLimit: model.deflectionLimit,
		deflectionLimitTotal: model.deflectionLimitTotal,
		deflectionGoverning: model.deflectionGoverns,
		eta: model.eta,
		gradeConfirmed: model.gradeConfirmed || undefined
	};
}
