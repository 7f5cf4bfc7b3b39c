// Standard base64 (with padding), as the backup file carries photo bytes.
const BASE64 = /^(?:[A-Za-z0-9+/]{4})*(?:[A-Za-z0-9+/]{2}==|[A-Za-z0-9+/]{3}=)?$/;

/** Bytes per `String.fromCharCode` call: well under any engine's argument limit. */
const CHUNK = 0x8000;

/**
 * Bytes as base64 text.
 * @example
 * bytesToBase64(new Uint8Array([104, 105]).buffer) // 'aGk='
 */
export function bytesToBase64(data: ArrayBuffer): string {
	const bytes = new Uint8Array(data);
	let binary = '';
	for (let i = 0; i < bytes.length; i += CHUNK) {
		binary += String.fromCharCode(...bytes.subarray(i, i + CHUNK));
	}
	return btoa(binary);
}

/**
 * Base64 text as bytes, or null when the text is not strict base64 (no spaces, right padding).
 * @example
 * base64ToBytes('aGk=') // ArrayBuffer [104, 105]
 */
export function base64ToBytes(text: string): ArrayBuffer | null {
	if (!BASE64.test(text)) return null;
	const binary = atob(text);
	const bytes = new Uint8Array(binary.length);
	for (let i = 0; i < binary.length; i++) bytes[i] = binary.charCodeAt(i);
	return bytes.buffer;
}

/** How many bytes base64 text of this length decodes to, at most (checked before decoding). */
export function decodedLength(chars: number): number {
	return Math.floor((chars * 3) / 4);
}
