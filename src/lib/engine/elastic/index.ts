/**
 * Elastic analysis of a beam line: reactions, shear, moment and deflection by the stiffness
 * method with exact fields inside each span, and the elastic limit factors.
 */
export { analyseElastic } from './analyse';
export { findMechanismIssues } from './mechanism';
export {
	computeElasticLimitFactor,
	firstHingeFactor,
	firstYieldFactor,
	type ElasticLimitInput,
	type ElasticLimitResult,
	type FirstHingeInput,
	type FirstYieldInput
} from './limit-factor';
export type {
	ElasticDiagramPoint,
	ElasticInput,
	ElasticResult,
	ElasticState,
	LocatedValue,
	NodeReaction,
	Side
} from './types';
