import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
	buildShareLink,
	compactCase,
	decodeCaseFromFragment,
	encodeCaseToFragment,
	expandCase,
	KEY_CODES,
	VALUE_CODES
} from '../../../src/lib/share';
import type { CaseFile } from '../../../src/lib/storage';

// Demo data, invented: a single span carrying a temporary point load.
const demo: CaseFile = {
	format: 'hingepoint.case',
	version: 1,
	title: 'DEMO — hoist beam, café basement',
	beam: {
		spans: [4.8],
		supports: ['pin', 'pin'],
		section: { designation: 'UB 254x146x31' },
		grade: 'S275',
		restraint: { lateral: 'continuous', loadHeight: 'bottom-flange' }
	},
	loads: [
		{ kind: 'uniform', from: 0, to: 4.8, value: 3.2, action: 'permanent' },
		{ kind: 'point', x: 2.1, value: 12.625, action: 'temporary' }
	],
	factors: { set: 'en1990-6.10', permanent: 1.35, imposed: 1.5, temporary: 1.5 },
	deflectionLimit: 200
};

// Any JSON object with the case header and top-level shape; JSON.parse(JSON.stringify(…)) keeps
// it to what JSON carries.
const anyCase = fc
	.record({
		rest: fc.dictionary(fc.string(), fc.jsonValue()),
		beam: fc.dictionary(fc.string(), fc.jsonValue()),
		loads: fc.array(fc.jsonValue())
	})
	.map(({ rest, beam, loads }) =>
		JSON.parse(JSON.stringify({ ...rest, format: 'hingepoint.case', version: 1, beam, loads }))
	);

describe('share links', () => {
	it('reopen the same case (round trip, property)', () => {
		fc.assert(
			fc.property(anyCase, (caseFile) => {
				const decoded = decodeCaseFromFragment(`#${encodeCaseToFragment(caseFile)}`);
				expect(decoded).toEqual({ ok: true, value: caseFile, warnings: [] });
			})
		);
	});

	it('restore any key and value exactly, even ones that look like codes or __proto__ (property)', () => {
		const codes = Object.values(VALUE_CODES).flatMap((t) => [
			...Object.keys(t),
			...Object.values(t)
		]);
		const special = ['~', '~p', '__proto__', 'beam'];
		const tricky = fc.constantFrom(...Object.values(KEY_CODES), ...codes, ...special);
		const enumKey = fc.constantFrom(...Object.keys(VALUE_CODES));
		const leaf = fc.oneof(fc.jsonValue(), tricky, fc.array(tricky));
		const entry = fc.tuple(fc.oneof(fc.string(), tricky, enumKey), leaf);
		const obj = fc.letrec((tie) => ({
			node: fc
				.array(fc.oneof(entry, fc.tuple(enumKey, tie('node'))), { maxLength: 6 })
				.map(Object.fromEntries)
		})).node;
		fc.assert(
			fc.property(obj, (value) => {
				const plain = JSON.parse(JSON.stringify(value));
				expect(expandCase(JSON.parse(JSON.stringify(compactCase(plain))))).toEqual(plain);
			})
		);
	});

	it('code the enumerated values of a load', () => {
		expect(compactCase({ loads: [{ kind: 'point', x: 2, action: 'temporary' }] })).toEqual({
			l: [{ k: 'p', x: 2, c: 't' }]
		});
		// A value that is itself a code is escaped, not confused with the coded value.
		expect(compactCase({ kind: 'p' })).toEqual({ k: '~p' });
	});

	it('leave the short keys of a custom section as they are', () => {
		const section = { shape: 'I', h: 300, b: 150, tw: 7.1, tf: 10.7, r: 15 };
		const compacted = { n: { y: 'i', h: 300, b: 150, tw: 7.1, tf: 10.7, r: 15 } };
		expect(compactCase({ section })).toEqual(compacted);
	});

	it('is shorter than the plain base64url of the JSON', () => {
		const fragment = encodeCaseToFragment(demo);
		const plain = Buffer.from(JSON.stringify(demo), 'utf8').toString('base64url');
		expect(fragment.length).toBeLessThan(plain.length * 0.75);
	});

	it('build a /check link whose fragment decodes', () => {
		const link = buildShareLink('https://example.org/', demo);
		const url = new URL(link);
		expect(url.pathname).toBe('/check');
		expect(decodeCaseFromFragment(url.hash)).toMatchObject({ ok: true, value: demo });
	});

	it('refuse a link cut anywhere short (property)', () => {
		const payload = encodeCaseToFragment(demo);
		fc.assert(
			fc.property(fc.integer({ min: 0, max: payload.length - 1 }), (cut) => {
				const decoded = decodeCaseFromFragment(payload.slice(0, cut));
				expect(decoded.ok).toBe(false);
			})
		);
	});

	it('explain a missing, damaged, foreign or newer link', () => {
		const code = (hash: string) => {
			const decoded = decodeCaseFromFragment(hash);
			return decoded.ok ? 'ok' : decoded.issues.map((i) => `${i.path}:${i.code}`).join();
		};
		const b64 = (value: unknown) =>
			Buffer.from(JSON.stringify(value), 'utf8').toString('base64url');
		expect(code('')).toBe('link:link-missing-case');
		expect(code('#x=1')).toBe('link:link-missing-case');
		expect(code('#c=abc')).toBe('link:link-damaged');
		expect(code('#c=1.%%%')).toBe('link:link-damaged');
		expect(code(`#c=1.${b64('just text')}`)).toBe('link:link-damaged');
		expect(code(`#c=1.${b64({ B: {} })}`)).toBe('link:link-damaged');
		expect(code(`#c=1.${b64({ v: 1, B: {} })}`)).toBe('link:link-damaged');
		expect(code(`#c=2.${b64({ v: 1 })}`)).toBe('link:link-newer');
		expect(code(`#c=1.${b64({ v: 2, B: {}, l: [] })}`)).toBe('link:link-newer');
		const damaged = decodeCaseFromFragment('#c=1.@@');
		expect(damaged.ok === false && damaged.issues[0].message).toMatch(/damaged or cut short/);
	});
});
