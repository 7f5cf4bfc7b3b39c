/**
 * EN 1990 / EN 1993-1-1 / EN 1993-1-5 with recommended values: the Eurocode design basis.
 * Resistances are computed with γM = 1 and multiplied by 1/γM0 or 1/γM1 (the neutral multipliers).
 */
import type { DesignBasis } from '../design-basis';
import { resolveFactors, type FactorSettings } from './factors';
import { classifySectionEN } from '../../section/index';
import { E_STEEL, G_STEEL } from '../../units';
import { decideRoute } from './scope';
import { checkWebSlenderness, computePlasticShearResistance, computeShearArea } from './shear';
import { computeReducedMomentResistance, computeShearReduction } from './interaction';
import {
	computeLtbResistance,
	selectBucklingCurve,
	selectLtbMethod,
	type BucklingCurve,
	type LtbMethod
} from './ltb-curves';
import { computeWebForceResistance } from './web';
import { computeStableLength } from './stable-length';
import { EUROCODE_WORDS, TYPE_WORDS } from './words';

/** The Eurocode basis (recommended values; every factor editable through the settings). */
export const en1993: DesignBasis<FactorSettings> = {
	id: 'en1993',
	name: 'EN 1990 and EN 1993-1-1 (recommended values)',
	E: E_STEEL,
	G: G_STEEL,
	words: EUROCODE_WORDS,
	resolveFactors(settings, options) {
		const f = resolveFactors(settings, options);
		return {
			set: f.set,
			combinations: f.combinations,
			resistance: { section: 1 / f.gammaM0, member: 1 / f.gammaM1 },
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
	computeBendingResistance: (o) => (o.elastic ? o.Wel : o.Wpl) * o.fy * o.resistance.section,
	computeShearArea,
	computeShearResistance: (o) =>
		computePlasticShearResistance({ Av: o.Av, fy: o.fy, gammaM0: 1 }) * o.resistance.section,
	checkWebSlenderness,
	computeShearReduction,
	// These two run for every load arrangement and trial load: their inputs are written out
	// field by field, as a spread with added keys costs microseconds each in V8 (measured on Node 20).
	computeReducedMomentResistance: (o) =>
		computeReducedMomentResistance({
			Wpl: o.Wpl,
			Aw: o.Aw,
			tw: o.tw,
			fy: o.fy,
			rho: o.rho,
			gammaM0: 1
		}) * o.resistance.section,
	computeLtbResistance(o) {
		const method = selectLtbMethod(o.shape);
		const curve = selectBucklingCurve({ shape: o.shape, h: o.h, b: o.b, method });
		const at = (c: BucklingCurve, m: LtbMethod) =>
			computeLtbResistance({ Wy: o.Wy, fy: o.fy, mcr: o.mcr, gammaM1: 1, curve: c, method: m });
		const r = at(curve, method);
		const clause = method === 'rolled' ? 'EN 1993-1-1 6.3.2.3' : 'EN 1993-1-1 6.3.2.2';
		const generalCurve = selectBucklingCurve({ shape: o.shape, h: o.h, b: o.b, method: 'general' });
		const general = at(generalCurve, 'general');
		return {
			mbRd: r.mbRd * o.resistance.member,
			clause,
			note: `χLT by ${clause}, curve ${curve}; Mcr by the energy method for this segment.`,
			values: { lambdaLT: r.lambdaBar, chiLT: r.chiLT, chiLTGeneral: general.chiLT }
		};
	},
	computeWebResistance(o) {
		const web = computeWebForceResistance({ ...o, gammaM1: 1 });
		const ss = Math.min(o.ss, o.hw);
		return {
			fRd: web.fRd * o.resistance.member,
			kind: `type ${web.type}`,
			place: web.type === 'a' ? 'span' : web.type === 'b' ? 'through' : 'end',
			clause: 'EN 1993-1-5 6.2–6.6',
			note:
				`Load type (${web.type}) of EN 1993-1-5 Figure 6.1, ${TYPE_WORDS[web.type]}; ` +
				`stiff bearing ${Math.round(ss)} mm.`,
			values: { ss, c: web.c, kF: web.kF, ly: web.ly, chiF: web.chiF, lEff: web.lEff },
			bendingInteraction: {
				clause: 'EN 1993-1-5 6.2–6.6, 7.2(1)',
				note: ' Governed by the interaction with bending, η2 + 0.8·η1 ≤ 1.4.'
			}
		};
	},
	computeStableLength
};
