/**
 * Clauses, labels and notation of the Eurocode basis: the words its rows and report use.
 */
import type { BasisWords } from '../basis-types';

/** Plain words for the load types of EN 1993-1-5 Figure 6.1. */
export const TYPE_WORDS = {
	a: 'resisted by web shear',
	b: 'passing through the web to the support',
	c: 'next to an unstiffened end'
} as const;

/** The words of the Eurocode basis. */
export const EUROCODE_WORDS: BasisWords = {
	short: 'Eurocode',
	clauses: {
		plasticBending: 'EN 1993-1-1 5.4.3, 6.2.5',
		elasticPlasticSection: 'EN 1993-1-1 6.2.5 (Wpl·fy), elastic analysis',
		elasticFirstYield: 'EN 1993-1-1 6.2.5 (Wel·fy)',
		shear: 'EN 1993-1-1 6.2.6',
		interaction: 'EN 1993-1-1 6.2.8',
		ltb: 'EN 1993-1-1 6.3.2'
	},
	labels: {
		plasticBending: 'Bending: plastic collapse',
		elasticPlasticSection: 'Bending: plastic resistance at the first hinge',
		elasticFirstYield: 'Bending: elastic resistance (first yield)'
	},
	hingeShearReduction: 'Hinge resistance reduced for shear (EN 1993-1-1 6.2.8)',
	stableLength: 'the stable length',
	notation: {
		vEd: 'VEd',
		vRd: 'Vpl,Rd',
		mEd: 'MEd',
		mcr: 'Mcr',
		chiLT: 'χLT',
		mbRd: 'Mb,Rd',
		myVRd: 'My,V,Rd',
		fEd: 'FEd',
		fRd: 'FRd'
	},
	sectionRank: { 1: 'Class 1', 2: 'Class 2', 3: 'Class 3', 4: 'Class 4' },
	describeFactors: (t) =>
		`Design loads: permanent × ${t.gammaGsup}, imposed × ${t.gammaQ}, temporary × ${t.gammaT}; ` +
		`resistance factors γM0 = ${t.gammaM0}, γM1 = ${t.gammaM1}.`,
	modulus: 'E = 210 000 MPa',
	plasticAssumption:
		'hinges need Class 1 sections with lateral and torsional restraint at and near them.',
	knownMpNotice:
		'The plastic moment was entered directly: confirm the section is Class 1 and the value ' +
		'includes any section loss.',
	deflectionLimits: { temporary: 200, total: 200 },
	deflectionSource: 'common practice, not a code value'
};
