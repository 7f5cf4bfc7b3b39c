/**
 * Links from anywhere: whatever a `#c=` fragment holds, the check screen gets either a case with
 * the structure it draws and edits, or a plain message. Never a throw, never a hollow case.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
	encodeCaseToFragment,
	findShapeProblem,
	LINK_LIMITS,
	openSharedCase
} from '../../../src/lib/share';
import { createBlankCase, createDemoCase } from '../../../src/lib/ui/state/demo-case';
import { readSection } from '../../../src/lib/ui/state/case-file';
import { totalLength } from '../../../src/lib/ui/state/beam-layout';

/** A link fragment carrying exactly this JSON text (the short keys as the app writes them). */
const linkTo = (json: string) => `#c=1.${Buffer.from(json, 'utf8').toString('base64url')}`;

/** What the screen would be told: 'ok', or the refusal's code and message. */
function answer(json: string): { code: string; message: string } {
	const opened = openSharedCase(linkTo(json));
	if (opened.ok) return { code: 'ok', message: '' };
	return { code: opened.issues[0].code, message: opened.issues[0].message };
}

// A valid link in short keys: one span, pins both ends, a library section, one point load.
const VALID = {
	v: 1,
	B: { s: [4], u: ['p', 'p'], n: { e: 'UB 254x146x31' }, g: 'S275' },
	l: [{ k: 'p', x: 2, a: 10, c: 't' }]
};
const withBeam = (beam: object) => JSON.stringify({ ...VALID, B: { ...VALID.B, ...beam } });

describe('opening a shared link', () => {
	it('opens the demo and a blank check as they were shared', () => {
		for (const made of [createDemoCase(), createBlankCase()]) {
			const opened = openSharedCase(`#${encodeCaseToFragment(made)}`);
			// JSON drops the blank case's undefined fields, as the link does.
			expect(opened).toEqual({ ok: true, value: JSON.parse(JSON.stringify(made)), warnings: [] });
		}
		expect(answer(JSON.stringify(VALID)).code).toBe('ok');
	});

	it('refuses hollow cases with a message that names what is missing', () => {
		expect(answer(JSON.stringify({ B: {} })).code).toBe('link-damaged');
		const hollow = answer(JSON.stringify({ v: 1, B: {}, l: [] }));
		expect(hollow.code).toBe('link-incomplete');
		expect(hollow.message).toBe(
			'This link does not hold a complete check (beam.spans: missing), so it was not opened. Ask for the link again.'
		);
		expect(answer(withBeam({ n: undefined })).message).toMatch(/\(beam\.section: missing\)/);
		expect(answer(withBeam({ s: [] })).message).toMatch(/\(beam\.spans: missing\)/);
		expect(answer(withBeam({ u: undefined })).message).toMatch(/\(beam\.supports: missing\)/);
		expect(answer(JSON.stringify({ v: 1, B: VALID.B })).code).toBe('link-damaged');
	});

	it('refuses nulls where the screen needs lists, objects or numbers', () => {
		expect(answer('null').code).toBe('link-damaged');
		expect(answer(JSON.stringify({ v: 1, B: null, l: null })).code).toBe('link-damaged');
		const cases: [string, RegExp][] = [
			[
				JSON.stringify({ v: 1, B: { s: null, u: null, n: null }, l: [null] }),
				/beam\.spans: missing/
			],
			[withBeam({ s: ['4'] }), /beam\.spans\[0\]: not a number/],
			[withBeam({ u: [null, 'p'] }), /beam\.supports\[0\]: not text/],
			[withBeam({ n: null }), /beam\.section: missing/],
			[withBeam({ n: [null] }), /beam\.section: missing/],
			[withBeam({ g: null }), /beam\.grade/],
			[withBeam({ R: null }), /beam\.restraint: not an object/],
			[withBeam({ R: { q: null } }), /beam\.restraint\.lateral/],
			[withBeam({ G: [{}, 100] }), /beam\.bearing\[0\]: not a number/],
			[withBeam({ j: [null] }), /beam\.joints\[0\]: not text/],
			[JSON.stringify({ ...VALID, l: [null] }), /loads\[0\]: not a load/],
			[
				JSON.stringify({ ...VALID, l: [{ k: null }] }),
				/loads\[0\]\.kind: not point, uniform or linear/
			],
			[
				JSON.stringify({ ...VALID, l: [{ k: 'p', x: [], a: 1, c: 't' }] }),
				/loads\[0\]\.x: not a number/
			],
			[
				JSON.stringify({ ...VALID, l: [{ k: 'u', F: 0, T: 4, a: 1, c: null }] }),
				/loads\[0\]\.action: not text/
			],
			[JSON.stringify({ ...VALID, f: null }), /factors: not an object/],
			[JSON.stringify({ ...VALID, i: null }), /title: not text/]
		];
		for (const [json, expected] of cases) {
			const opened = answer(json);
			expect(opened.code, json).toBe('link-incomplete');
			expect(opened.message, json).toMatch(expected);
		}
	});

	it('opens numbers not entered yet (null), which the form shows empty and the engine names', () => {
		expect(answer(withBeam({ s: [null], G: [null, null] })).code).toBe('ok');
		expect(
			answer(JSON.stringify({ ...VALID, l: [{ k: 'p', x: null, a: null, c: 't' }] })).code
		).toBe('ok');
	});

	it('refuses a field named __proto__ anywhere, even one that would fill in what is missing', () => {
		// JSON.parse makes `__proto__` an own field; a copy made key by key would make it the prototype.
		const onTop =
			'{"v":1,"__proto__":{"x":1},"B":{"s":[4],"u":["p","p"],"n":{"e":"UB 254x146x31"}},"l":[]}';
		expect(answer(onTop)).toEqual({
			code: 'link-incomplete',
			message: expect.stringMatching(/\(__proto__: a field named __proto__ is not accepted\)/)
		});
		const fillsIn = '{"v":1,"B":{"__proto__":{"s":[4],"u":["p","p"],"n":{}}},"l":[]}';
		expect(answer(fillsIn).message).toMatch(/beam\.__proto__/);
		const inLoad = JSON.stringify(VALID).replace('"k":"p"', '"__proto__":{},"k":"p"');
		expect(answer(inLoad).message).toMatch(/loads\[0\]\.__proto__/);
		expect(({} as Record<string, unknown>).s).toBeUndefined();
	});

	it('refuses deep nesting without overflowing the stack', () => {
		const deep = `{"v":1,"B":{"s":[4],"u":["p","p"],"n":${'['.repeat(20_000)}${']'.repeat(20_000)}},"l":[]}`;
		expect(() => openSharedCase(linkTo(deep))).not.toThrow();
		expect(answer(deep).code).toBe('link-too-large');
		// Just inside the limit still opens as far as nesting goes (the section is then the problem).
		const inside = `{"v":1,"B":{"s":[4],"u":["p","p"],"n":${'['.repeat(LINK_LIMITS.depth - 3)}${']'.repeat(LINK_LIMITS.depth - 3)}},"l":[]}`;
		expect(answer(inside).code).toBe('link-incomplete');
	});

	it('refuses a link far longer than any check, and one with too many values', () => {
		const long = `#c=1.${'A'.repeat(LINK_LIMITS.characters + 1)}`;
		expect(openSharedCase(long)).toMatchObject({ ok: false, issues: [{ code: 'link-too-large' }] });
		const wide = JSON.stringify({ ...VALID, junk: new Array(LINK_LIMITS.values).fill(0) });
		expect(answer(wide).code).toBe('link-too-large');
	});

	it('refuses more spans or loads than the engine takes, before the form tries to draw them', () => {
		const spans = withBeam({ s: new Array(3000).fill(1), u: new Array(3001).fill('p') });
		expect(answer(spans).message).toMatch(/beam\.spans: more than 50 spans/);
		const loads = JSON.stringify({ ...VALID, l: new Array(201).fill(VALID.l[0]) });
		expect(answer(loads).message).toMatch(/loads: more than 200 loads/);
	});

	it('lets huge but finite numbers through to the engine, and refuses infinite ones', () => {
		// The engine's range checks give field messages for these; the screen can show them.
		expect(answer(withBeam({ s: [1e308] })).code).toBe('ok');
		expect(
			answer(JSON.stringify({ ...VALID, l: [{ k: 'p', x: 1e308, a: -1e308, c: 't' }] })).code
		).toBe('ok');
		// JSON has no Infinity, but 1e400 parses to it.
		const infinite = JSON.stringify(VALID).replace('"s":[4]', '"s":[1e400]');
		expect(answer(infinite).message).toMatch(/beam\.spans\[0\]: not a number/);
	});

	it('gives the screen a readable case or a message, whatever the link holds (property)', () => {
		const anyPayload = fc.oneof(
			fc.jsonValue().map((value) => linkTo(JSON.stringify(value))),
			fc
				.record({
					v: fc.constant(1),
					B: fc.dictionary(fc.constantFrom('s', 'u', 'j', 'n', 'g', 'R', 'G', 'w'), fc.jsonValue()),
					l: fc.array(fc.jsonValue())
				})
				.map((value) => linkTo(JSON.stringify(value))),
			fc.string().map((text) => `#c=${text}`)
		);
		fc.assert(
			fc.property(anyPayload, (hash) => {
				const opened = openSharedCase(hash);
				if (!opened.ok) {
					expect(opened.issues[0].message.length).toBeGreaterThan(20);
					return;
				}
				expect(findShapeProblem(opened.value)).toBeNull();
				expect(Number.isFinite(totalLength(opened.value.beam))).toBe(true);
				expect(typeof readSection(opened.value)).toBe('object');
			})
		);
	});

	it('gives the screen a readable case or a message when any one field of a good link is replaced (property)', () => {
		const paths: string[][] = [
			['B'],
			['l'],
			['B', 's'],
			['B', 'u'],
			['B', 'n'],
			['B', 'g'],
			['B', 'R'],
			['l', '0'],
			['l', '0', 'k'],
			['l', '0', 'x']
		];
		fc.assert(
			fc.property(fc.constantFrom(...paths), fc.jsonValue(), (path, replacement) => {
				const value = JSON.parse(JSON.stringify(VALID));
				let at = value;
				for (const key of path.slice(0, -1)) at = at[key];
				at[path[path.length - 1]] = replacement;
				const opened = openSharedCase(linkTo(JSON.stringify(value)));
				if (opened.ok) expect(findShapeProblem(opened.value)).toBeNull();
				else expect(opened.issues[0].message).toMatch(/^This link /);
			})
		);
	});
});
