/** Share links: a case encoded in the URL fragment, so no server is involved. */
export {
	buildShareLink,
	decodeCaseFromFragment,
	describeIncomplete,
	encodeCaseToFragment,
	LINK_LIMITS,
	LINK_VERSION,
	openSharedCase
} from './fragment';
export { findShapeProblem, type ShapeProblem } from './case-shape';
export { compactCase, expandCase, KEY_CODES, VALUE_CODES } from './compact';
export { decodeBase64Url, encodeBase64Url } from './base64url';
