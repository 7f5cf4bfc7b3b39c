/** Share links: a case encoded in the URL fragment, so no server is involved. */
export {
	buildShareLink,
	decodeCaseFromFragment,
	encodeCaseToFragment,
	LINK_VERSION
} from './fragment';
export { compactCase, expandCase, KEY_CODES, VALUE_CODES } from './compact';
export { decodeBase64Url, encodeBase64Url } from './base64url';
