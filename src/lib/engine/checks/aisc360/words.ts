/**
 * Clauses, labels and notation of the AISC bases (LRFD and ASD): the words their rows and report
 * use. No Eurocode notation appears here: φMn, Lb, Cb, compact/noncompact, AISC 360-22 clauses.
 */
import type { BasisWords } from '../basis-types';
import type { AiscMethod } from './resistance';

const NOTATION: Record<AiscMethod, Record<string, string>> = {
	lrfd: {
		vEd: 'Vu',
		vRd: 'φvVn',
		mEd: 'Mu',
		mcr: 'Mcr',
		mbRd: 'φbMn',
		fEd: 'Ru',
		fRd: 'φRn'
	},
	asd: {
		vEd: 'Va',
		vRd: 'Vn/Ωv',
		mEd: 'Ma',
		mcr: 'Mcr',
		mbRd: 'Mn/Ωb',
		fEd: 'Ra',
		fRd: 'Rn/Ω'
	}
};

const fmt = (v: number | undefined) => String(Number((v ?? 0).toPrecision(4)));

/** A load factor as written before a load symbol: `1.2`, nothing for 1 (`D + L`). */
const coef = (v: number | undefined) => (v === 1 ? '' : fmt(v));

/** How the proposed load is factored: as live load, or by its own factor. */
const temporaryWords = (t: Record<string, number>) =>
	t.temporary === t.live
		? `the proposed temporary load as live load × ${fmt(t.temporary)}`
		: `the proposed temporary load × ${fmt(t.temporary)} (own factor)`;

/** The factor sentence of the report's assumptions. */
function describeFactors(method: AiscMethod, t: Record<string, number>): string {
	if (method === 'lrfd') {
		return (
			`Load combinations (ASCE 7-22 2.3.1): ${coef(t.deadAlone)}D (dead load alone: no live ` +
			`and no temporary load), and ${coef(t.dead)}D + ${coef(t.live)}L with ` +
			`${temporaryWords(t)}, existing live load patterned span ` +
			'by span; ' +
			'0.9D is not used (it belongs to the wind and seismic combinations, not to a ' +
			'gravity-only beam). Resistance factors φb = 0.90, φv = 1.00 for rolled I-shapes within ' +
			'G2.1(a) (0.90 otherwise), and the φ of each limit state of J10.'
		);
	}
	return (
		`Load combinations (ASCE 7-22 2.4.1): ${coef(t.deadAlone)}D (dead load alone), and ` +
		`${coef(t.dead)}D + ${coef(t.live)}L with ${temporaryWords(t)}, existing live load ` +
		'patterned span by span. ' +
		'Safety factors Ωb = 1.67, Ωv = 1.50 for rolled I-shapes within G2.1(a) (1.67 otherwise), ' +
		'and the Ω of each limit state of J10.'
	);
}

/**
 * The words of an AISC basis.
 * @example writeAiscWords('lrfd').notation.mbRd // 'φbMn'
 */
export function writeAiscWords(method: AiscMethod): BasisWords {
	const strength = method === 'lrfd' ? 'φbMn' : 'Mn/Ωb';
	return {
		short: method === 'lrfd' ? 'AISC 360-22 LRFD' : 'AISC 360-22 ASD',
		clauses: {
			plasticBending: 'AISC 360-22 Appendix 1 (inelastic analysis), F2.1',
			elasticPlasticSection: 'AISC 360-22 F2.1 (Mp = Fy·Zx), elastic analysis',
			elasticFirstYield: 'AISC 360-22 F3, F7, F8 (noncompact), elastic analysis',
			shear: 'AISC 360-22 G2.1, G4, G5',
			interaction: null,
			ltb: 'AISC 360-22 F2.2'
		},
		labels: {
			plasticBending: `Flexure: plastic collapse (φb = 0.90 on Mp)`,
			elasticPlasticSection: `Flexure: ${strength} of a compact section, elastic moments`,
			elasticFirstYield: `Flexure: ${strength} of a noncompact section, elastic moments`
		},
		hingeShearReduction: 'Hinge strength reduced for shear',
		stableLength: 'Lpd (AISC 360-22 Appendix 1, 1.3.2c)',
		notation: NOTATION[method],
		sectionRank: {
			1: 'compact, within λpd for plastic hinges',
			2: 'compact',
			3: 'noncompact',
			4: 'slender or not covered'
		},
		describeFactors: (t) => describeFactors(method, t),
		modulus: 'E = 29 000 ksi',
		plasticAssumption:
			'hinges need sections compact to λpd, Fy ≤ 65 ksi and the compression flange braced ' +
			'within Lpd next to each hinge (AISC 360-22 Appendix 1); LRFD only.',
		knownMpNotice:
			'The plastic moment was entered directly: confirm the section is compact to λpd ' +
			'(AISC 360-22 Appendix 1) and the value includes any section loss.',
		// Common practice for floors (span/360 live, span/240 total, as in IBC Table 1604.3).
		deflectionLimits: { temporary: 360, total: 240 },
		deflectionSource: 'common practice, not a code value'
	};
}
