/** Public API of the section library: shapes, tables, search, identification, loss, classes. */
export type * from './types';
export { resolveSection, type ResolveSectionOptions } from './resolve';
export { findSection, suggestSections, listSections } from './search';
export { listSectionFamilies, type SectionFamilyEntry } from './families';
export { parseDesignation } from './designation';
export {
	identifySection,
	type IdentifyCandidate,
	type IdentifyOptions,
	type SectionMeasurements
} from './identify';
export { computeSectionProperties } from './properties';
export {
	computeISectionProperties,
	computeRolledTorsionConstant,
	type ISectionOptions
} from './i-section';
export { computeRhsProperties, computeRhsCornerRadii } from './rhs';
export { applyDesignWall, computeHssCornerRadii, designWallFactor } from './hss-wall';
export { computeChsProperties } from './chs';
export { computeFlatProperties } from './flat';
export { applySectionLoss } from './loss';
export { validateSectionDims } from './validate-dims';
export { classifySectionEN, type EnClassification, type EnElementClass } from './classify-en';
export {
	classifySectionAISC,
	E_AISC,
	type AiscClassification,
	type AiscElementClass,
	type AiscCategory
} from './classify-aisc';
