/**
 * Types every design basis shares: factor settings and combinations, the scope decision, and the
 * inputs and results of the resistances a basis supplies. Basis-neutral code imports these from
 * here, never from a basis folder; each basis implements them (en1993/ today).
 */
import type { SectionShape } from '../section/types';
import type { AnalysisRoute } from './types';

/** Name of a factor set as written in a case file. */
export type FactorSetName = 'en1990-6.10' | 'en1990-6.10ab' | 'custom';

/** Factor settings as entered; missing values take the recommended ones. */
export interface FactorSettings {
	set: FactorSetName;
	/** γG,sup, unfavourable permanent action (recommended 1.35). */
	gammaGsup?: number;
	/** γG,inf, favourable permanent action (recommended 1.00). */
	gammaGinf?: number;
	/** γQ for existing imposed load (recommended 1.5). */
	gammaQ?: number;
	/** Factor on the temporary action; defaults to γQ. */
	gammaT?: number;
	/** Reduction ξ on unfavourable permanent action in 6.10b (recommended 0.85). */
	xi?: number;
	/** ψ0 for accompanying imposed load (0.7, categories A–D). */
	psi0?: number;
	/** ψ0 for the temporary action when it accompanies (recommended 1.0, construction loads). */
	psi0T?: number;
	/** Resistance factors γM0 and γM1 (recommended 1.00 both). */
	gammaM0?: number;
	gammaM1?: number;
}

/** One combination expression with its factors resolved. */
export interface Combination {
	/** `6.10`, `6.10a`, `6.10b` or `custom`, plus which action leads. */
	name: string;
	/** Factor on permanent action where unfavourable / favourable. */
	gammaGsup: number;
	gammaGinf: number;
	/** Factor on existing imposed load where present. */
	gammaImposed: number;
	/** Factor on the temporary action. */
	gammaTemporary: number;
}

/** Section class of EN 1993-1-1 Table 5.2 for major-axis bending. */
export type SectionClass = 1 | 2 | 3 | 4;

/** Facts the gate decides on. */
export interface ScopeInput {
	sectionClass: SectionClass;
	/** Steel with the ductility of EN 1993-1-1 3.2.2; false for cast or wrought iron. */
	ductile: boolean;
	/** False while an unknown or historic grade has not been confirmed by the user. */
	gradeConfirmed: boolean;
	/** hw/tw > 72ε/η: shear buckling to EN 1993-1-5 would be needed. */
	needsShearBucklingCheck: boolean;
	/** The plastic collapse solution was verified by statics (only read for Class 1). */
	collapseCertified: boolean;
	/**
	 * Every hinge of the mechanism sits at a lateral restraint and the segments next to it are
	 * within the stable length (6.3.5), or the flange is restrained throughout.
	 */
	hingesRestrained: boolean;
	/** Why the hinges are not restrained enough, for the message. */
	hingeRestraintNote?: string;
	/** Further reasons found elsewhere that put the beam outside scope. */
	otherReasons?: string[];
}

/** The route and the plain reasons for it. */
export interface ScopeDecision {
	route: AnalysisRoute;
	reasons: string[];
}

/** Dimensions and area needed for the shear area, mm and mm². */
export interface ShearAreaInput {
	shape: SectionShape;
	/** Gross area, mm². */
	A: number;
	/** Depth, flange width (or hollow width), mm. */
	h: number;
	b: number;
	/** Web and flange thickness (hollow: wall thickness in both), mm. */
	tw: number;
	tf: number;
	/** Root radius, mm (0 for welded or hollow). */
	r: number;
	/** η of EN 1993-1-5 5.1(2); 1.0 is the conservative default. */
	eta: number;
}

/** Inputs of {@link computeReducedMomentResistance}; mm, mm³, N/mm². */
export interface ReducedMomentInput {
	/** Plastic modulus about the bending axis, mm³. */
	Wpl: number;
	/** Web area hw·tw (all webs), mm². */
	Aw: number;
	/** Web thickness (sum over webs), mm. */
	tw: number;
	fy: number;
	gammaM0: number;
	rho: number;
}

/** χLT and Mb,Rd for one segment. */
export interface LtbResistance {
	lambdaBar: number;
	chiLT: number;
	/** Mb,Rd = χLT·Wy·fy/γM1, N·mm. */
	mbRd: number;
}

/** Load introduction type of EN 1993-1-5 Figure 6.1. */
export type WebLoadType = 'a' | 'b' | 'c';

/** Inputs of {@link computeWebResistance}; mm and N/mm². */
export interface WebResistanceInput {
	type: WebLoadType;
	/** Clear web depth between flanges hw, mm. */
	hw: number;
	tw: number;
	/** Flange width and thickness, mm. */
	bf: number;
	tf: number;
	/** Yield strength of web and flange, N/mm². */
	fyw: number;
	fyf: number;
	E: number;
	/** Stiff bearing length ss, mm (taken no longer than hw, EN 1993-1-5 6.3). */
	ss: number;
	/** Type (c): clear distance from the end of the stiff bearing to the end of the member, mm. */
	c?: number;
	gammaM1: number;
}

/** Where a force stands, for {@link computeWebForceResistance}; mm and N/mm². */
export interface WebForceInput extends Omit<WebResistanceInput, 'type' | 'c'> {
	/** The force passes through the web to a support under the other flange. */
	throughWeb: boolean;
	/** Clear distance from the end of the stiff bearing to the nearest unstiffened end, mm. */
	endDistance: number;
}

/** Intermediate values and the resistance, N and mm. */
export interface WebResistance {
	type: WebLoadType;
	/** Clear distance to the end used by type (c), mm; 0 for (a) and (b). */
	c: number;
	kF: number;
	/** Fcr = 0.9·kF·E·tw³/hw, N (eq. 6.5). */
	fCr: number;
	m1: number;
	m2: number;
	/** Effective loaded length ly, mm (6.10–6.12). */
	ly: number;
	lambdaF: number;
	chiF: number;
	/** Leff = χF·ly, mm (6.2). */
	lEff: number;
	/** FRd = fyw·Leff·tw/γM1, N (6.1). */
	fRd: number;
}
