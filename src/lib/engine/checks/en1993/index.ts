/**
 * EN 1990 / EN 1993-1-1 / EN 1993-1-5 with recommended values: the first design basis.
 */
import type { DesignBasis } from '../design-basis';
import { resolveFactors, type FactorSettings } from './factors';
import { classifySectionEN } from '../../section/index';
import { decideRoute } from './scope';
import { checkWebSlenderness, computePlasticShearResistance, computeShearArea } from './shear';
import { computeReducedMomentResistance, computeShearReduction } from './interaction';
import { computeLtbResistance, selectBucklingCurve, selectLtbMethod } from './ltb-curves';
import { computeWebForceResistance } from './web';
import { computeStableLength } from './stable-length';

/** The Eurocode basis (recommended values; every factor editable through the settings). */
export const en1993: DesignBasis<FactorSettings> = {
	id: 'en1993',
	name: 'EN 1990 and EN 1993-1-1 (recommended values)',
	resolveFactors(settings, options) {
		const f = resolveFactors(settings, options);
		return {
			set: f.set,
			combinations: f.combinations,
			gammaM0: f.gammaM0,
			gammaM1: f.gammaM1,
			table: {
				gammaGsup: f.gammaGsup,
				gammaGinf: f.gammaGinf,
				gammaQ: f.gammaQ,
				gammaT: f.gammaT,
				xi: f.xi,
				psi0: f.psi0,
				psi0T: f.psi0T,
				gammaM0: f.gammaM0,
				gammaM1: f.gammaM1
			}
		};
	},
	decideRoute,
	classifySection: classifySectionEN,
	computeBendingResistance: (o) => ((o.elastic ? o.Wel : o.Wpl) * o.fy) / o.gammaM0,
	computeShearArea,
	computeShearResistance: computePlasticShearResistance,
	checkWebSlenderness,
	computeShearReduction,
	computeReducedMomentResistance,
	computeLtbResistance(o) {
		const method = selectLtbMethod(o.shape);
		const curve = selectBucklingCurve({ shape: o.shape, h: o.h, b: o.b, method });
		const r = computeLtbResistance({ ...o, curve, method });
		const clause = method === 'rolled' ? 'EN 1993-1-1 6.3.2.3' : 'EN 1993-1-1 6.3.2.2';
		const generalCurve = selectBucklingCurve({ shape: o.shape, h: o.h, b: o.b, method: 'general' });
		const general = computeLtbResistance({ ...o, curve: generalCurve, method: 'general' });
		return { ...r, method: clause, curve, chiGeneral: general.chiLT };
	},
	computeWebResistance: computeWebForceResistance,
	computeStableLength
};
