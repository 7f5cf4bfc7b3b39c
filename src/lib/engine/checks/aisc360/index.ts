/**
 * AISC 360-22 with ASCE 7-22 gravity combinations: the LRFD and ASD design bases. Resistances
 * are available strengths: φRn on LRFD, Rn/Ω on ASD, with the factor of each limit state; the
 * neutral multipliers are φb = 0.90 or 1/Ωb = 1/1.67 (flexure and plastic moments). E = 29 000 ksi
 * and G = 11 200 ksi (from memory).
 */
import type { DesignBasis } from '../design-basis';
import type { FactorSettings } from '../basis-types';
import { describeMember } from '../member';
import { US } from '../../units';
import { listAsceCombinations, resolveAsceFactors } from './combinations';
import { computeLpd } from './hinge-bracing';
import { computeCb } from './moment-gradient';
import {
	computeAiscShearArea,
	computeMemberFlexure,
	computeMemberShear,
	rankMember
} from './member-strength';
import { computeAvailableStrength, FLEXURE_FACTORS, type AiscMethod } from './resistance';
import { decideAiscRoute } from './scope';
import { computeAiscWebReading } from './web-strength';
import { writeAiscWords } from './words';

/** E and G of the Specification, N/mm² (29 000 and 11 200 ksi, from memory). */
const E = 29_000 * US.ksiToMPa;
const G = 11_200 * US.ksiToMPa;

/** Web slenderness beyond which G2.1 is not used here (h/tw = 260). */
const WEB_LIMIT = 260;

/**
 * The AISC basis for one method.
 * @example makeAiscBasis('lrfd').resolveFactors({ set: 'asce7-lrfd' }, { hasImposed: true })
 *   .combinations.map((c) => c.gammaTemporary) // [0, 1.6]
 */
export function makeAiscBasis(method: AiscMethod): DesignBasis<FactorSettings> {
	const available = (Rn: number, f = FLEXURE_FACTORS) => computeAvailableStrength(Rn, f, method);
	const flexureMultiplier = available(1);
	return {
		id: method === 'lrfd' ? 'aisc-lrfd' : 'aisc-asd',
		name:
			method === 'lrfd'
				? 'AISC 360-22 LRFD with ASCE 7-22 combinations'
				: 'AISC 360-22 ASD with ASCE 7-22 combinations',
		E,
		G,
		words: writeAiscWords(method),
		resolveFactors(settings) {
			const f = resolveAsceFactors(settings, method);
			const table: Record<string, number> = {
				deadAlone: f.alone,
				dead: f.dead,
				live: f.live,
				temporary: f.temporary
			};
			if (method === 'lrfd') table.phiB = FLEXURE_FACTORS.phi;
			else table.omegaB = FLEXURE_FACTORS.omega;
			return {
				set: f.set,
				combinations: listAsceCombinations(f, method),
				resistance: { section: flexureMultiplier, member: flexureMultiplier },
				table
			};
		},
		decideRoute: (s) => decideAiscRoute(s, method),
		classifySection(section, fy) {
			if (section.shape === 'known-mp' || section.dims === null || section.props === null) {
				const note =
					'Only Mp is known: compactness cannot be found from the dimensions; confirm the ' +
					'section is compact to λpd of AISC 360-22 Appendix 1.';
				return { class: null, note };
			}
			const r = rankMember(describeMember(section, fy), E);
			return { class: r.rank, note: r.note };
		},
		computeBendingResistance(m) {
			const r = computeMemberFlexure(m, { E, Lb: 0, ltb: { method: 'cb', Cb: 1 }, Cb: 1 });
			return available(r.Mn, r.factors);
		},
		computeShearArea: computeAiscShearArea,
		computeShearResistance(m) {
			const r = computeMemberShear(m, E);
			return available(r.Vn, r.factors);
		},
		checkWebSlenderness(o) {
			const ratio = o.hw / o.tw;
			return { ratio, limit: WEB_LIMIT, needsShearBucklingCheck: ratio > WEB_LIMIT };
		},
		// Chapter H has no shear–moment interaction for these members.
		computeShearReduction: () => 0,
		computeReducedMomentResistance: (o) => o.Wpl * o.fy * o.resistance.section,
		computeLtbResistance(o) {
			const moments = {
				Mmax: o.moments.max,
				MA: o.moments.quarter,
				MB: o.moments.centre,
				MC: o.moments.threeQuarter
			};
			const cbF11 = computeCb(moments);
			const Lb = o.length;
			const byCb = computeMemberFlexure(o, { E, Lb, ltb: { method: 'cb', Cb: cbF11 }, Cb: cbF11 });
			const isI = o.shape === 'I' || o.shape === 'welded-I';
			const byMcr = isI
				? computeMemberFlexure(o, { E, Lb, ltb: { method: 'mcr', Mcr: o.mcr }, Cb: cbF11 })
				: byCb;
			// The lower of F1-1 and the segment's own Mcr (load height included) governs.
			const useMcr = byMcr.Mn < byCb.Mn;
			const r = useMcr ? byMcr : byCb;
			const how = useMcr
				? `Cb,eq = ${(r.Cb ?? 1).toFixed(3)} from the segment's elastic critical moment ` +
					`(energy method, load height included), lower than Cb = ${cbF11.toFixed(3)} ` +
					'by F1-1: the more exact value is used.'
				: `Cb = ${cbF11.toFixed(3)} by F1-1 (not above the value from the segment's elastic ` +
					'critical moment).';
			return {
				mbRd: available(r.Mn, r.factors),
				clause: r.clause,
				note: isI ? how : `${r.clause}; Cb = ${cbF11.toFixed(3)} by F1-1.`,
				values: { ...r.values, cbF11 }
			};
		},
		computeWebResistance: (o) => computeAiscWebReading(o, method, o.fyf * o.Wel),
		computeStableLength(o) {
			// Lpd of Appendix 1, 1.3.2c from ψ (single curvature > 0; loaded segments come as 1).
			const psi = Math.max(-1, Math.min(1, o.psi));
			const moments = { Mstart: 1, Mend: psi, Mmid: (1 + psi) / 2, MmaxAbs: 1 };
			const shape = o.shape === 'RHS' ? 'rect-HSS' : o.shape === 'CHS' ? 'round-HSS' : 'I';
			if (o.shape === 'flat' || o.shape === 'known-mp') return null;
			const r = computeLpd({ shape, ry: o.iz, E, Fy: o.fy, moments });
			// No limit for round sections (1.3.2c).
			return r.Lpd ?? Number.MAX_VALUE;
		}
	};
}

/** AISC 360-22 LRFD with ASCE 7-22 §2.3.1. */
export const aiscLrfd = makeAiscBasis('lrfd');
/** AISC 360-22 ASD with ASCE 7-22 §2.4.1. */
export const aiscAsd = makeAiscBasis('asd');
