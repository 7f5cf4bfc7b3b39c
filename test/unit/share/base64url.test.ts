import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { decodeBase64Url, encodeBase64Url } from '../../../src/lib/share';

describe('base64url', () => {
	it('matches the test vectors of RFC 4648 §10, without padding (§5 alphabet)', () => {
		const vectors: [string, string][] = [
			['', ''],
			['f', 'Zg'],
			['fo', 'Zm8'],
			['foo', 'Zm9v'],
			['foob', 'Zm9vYg'],
			['fooba', 'Zm9vYmE'],
			['foobar', 'Zm9vYmFy']
		];
		for (const [text, encoded] of vectors) {
			expect(encodeBase64Url(text)).toBe(encoded);
			expect(decodeBase64Url(encoded)).toBe(text);
		}
	});

	it('agrees with Node’s own base64url encoder for any text (property)', () => {
		fc.assert(
			fc.property(fc.string({ unit: 'grapheme' }), (text) => {
				expect(encodeBase64Url(text)).toBe(Buffer.from(text, 'utf8').toString('base64url'));
				expect(decodeBase64Url(encodeBase64Url(text))).toBe(text);
			})
		);
	});

	it('refuses characters outside the alphabet, impossible lengths and invalid UTF-8', () => {
		expect(decodeBase64Url('Zm9v+')).toBeNull();
		expect(decodeBase64Url('Zm9v=')).toBeNull();
		expect(decodeBase64Url('Zm9vY')).toBeNull();
		// 0xC3 alone is a cut two-byte UTF-8 sequence.
		expect(decodeBase64Url(Buffer.from([0xc3]).toString('base64url'))).toBeNull();
	});
});
