// Chunked so a long payload does not overflow the argument list of String.fromCharCode.
const CHUNK = 0x8000;
const ALPHABET = /^[A-Za-z0-9_-]*$/;

/**
 * Encodes text as base64url (RFC 4648 §5) of its UTF-8 bytes, without padding.
 * @example
 * encodeBase64Url('é') // 'w6k'
 */
export function encodeBase64Url(text: string): string {
	const bytes = new TextEncoder().encode(text);
	let binary = '';
	for (let i = 0; i < bytes.length; i += CHUNK) {
		binary += String.fromCharCode(...bytes.subarray(i, i + CHUNK));
	}
	return btoa(binary).replace(/\+/g, '-').replace(/\//g, '_').replace(/=+$/, '');
}

/**
 * Decodes unpadded base64url back to text; null when the characters, the length or the UTF-8
 * are not valid (a damaged or cut link).
 * @example
 * decodeBase64Url('w6k') // 'é'
 */
export function decodeBase64Url(encoded: string): string | null {
	// A length of 4n + 1 can never come from whole bytes.
	if (!ALPHABET.test(encoded) || encoded.length % 4 === 1) return null;
	try {
		const binary = atob(encoded.replace(/-/g, '+').replace(/_/g, '/'));
		const bytes = Uint8Array.from(binary, (c) => c.charCodeAt(0));
		return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
	} catch {
		return null;
	}
}
