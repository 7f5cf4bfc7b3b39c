/**
 * The `check` command, run as a separate process on the demo fixtures (invented cases): exit
 * codes, the JSON fields, and one number against simple plastic theory (B.G. Neal, "The Plastic
 * Methods of Structural Analysis", 1977: W = 4Mp/L for a central load — from memory).
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const FIXTURES = 'test/fixtures/cases';

function runCheck(...args: string[]): { code: number | null; out: string; err: string } {
	// The local tsx binary is what `npx tsx` runs, without npx's start-up cost per call.
	const r = spawnSync('node_modules/.bin/tsx', ['src/cli/main.ts', 'check', ...args], {
		encoding: 'utf8',
		timeout: 60_000
	});
	return { code: r.status, out: r.stdout, err: r.stderr };
}

describe('check command', () => {
	it('prints one JSON report and exits 0; λ = 4Mp/(LW) for the known-Mp demo', () => {
		const r = runCheck(`${FIXTURES}/demo-known-mp-central-point.json`, '--json');
		expect(r.code).toBe(0);
		const report = JSON.parse(r.out);
		const [Mp, L, W] = [100, 6, 10]; // as in the fixture
		expect(Math.abs(report.collapse.loadFactor - (4 * Mp) / L / W)).toBeLessThan(1e-9 * 6.67);
		// Bending is the only check a known Mp allows: the answer is the same number.
		expect(report.answer.multiplier).toBe(report.collapse.loadFactor);
		expect(report.answer.allowable[0]).toMatchObject({ load: 0, unit: 'kN' });
		expect(report).toMatchObject({ format: 'hingepoint.report', version: 2 });
		for (const gone of [
			'mpRd',
			'temporaryCapacity',
			'allowable',
			'reserve',
			'verdict',
			'governing'
		]) {
			expect(report).not.toHaveProperty(gone);
		}
		const keys = ['answer', 'checks', 'design', 'collapse', 'effects', 'sections', 'grades'];
		for (const key of [...keys, 'notices', 'assumptions', 'engineVersion']) {
			expect(report).toHaveProperty(key);
		}
		expect(report.collapse).toMatchObject({ appliesTo: 'temporary', certified: true });
		expect(report.collapse.hinges[0]).toMatchObject({ x: 3 });
	});

	it('exits 0 also when the beam fails, and says so', () => {
		const r = runCheck(`${FIXTURES}/demo-overloaded.json`, '--json');
		expect(r.code).toBe(0);
		const collapse = JSON.parse(r.out).collapse;
		expect(collapse).toMatchObject({ status: 'fails-under-fixed', loadFactor: null });
	});

	it('adds the capacity curve field with --curve', () => {
		const r = runCheck(`${FIXTURES}/demo-hoist-on-ub.json`, '--json', '--curve');
		expect(r.code).toBe(0);
		expect(JSON.parse(r.out)).toHaveProperty('capacityCurve');
	});

	it('exits 2 on invalid input and names each field', () => {
		const r = runCheck(`${FIXTURES}/invalid-fields.json`, '--json');
		expect(r.code).toBe(2);
		const paths = JSON.parse(r.out).errors.map((e: { path: string }) => e.path);
		const expected = ['beam.spans[1]', 'beam.supports', 'beam.section.designation'];
		expect(paths).toEqual(expect.arrayContaining(expected));
	});

	it('exits 2 with an error object on a JSON syntax error or a missing file', () => {
		for (const file of [`${FIXTURES}/invalid-syntax.json`, `${FIXTURES}/no-such-case.json`]) {
			const r = runCheck(file, '--json');
			expect(r.code).toBe(2);
			expect(JSON.parse(r.out).errors[0].message).toMatch(/JSON|cannot read/);
		}
	});

	it('prints a readable summary without --json', () => {
		const dir = mkdtempSync(join(tmpdir(), 'hp-check-'));
		const file = join(dir, 'case.json');
		writeFileSync(
			file,
			JSON.stringify({
				format: 'hingepoint.case',
				version: 1,
				title: 'DEMO — invented text case',
				beam: {
					spans: [4],
					supports: ['fixed', 'free'],
					section: { mp: 40 },
					restraint: { lateral: 'continuous' }
				},
				loads: [{ kind: 'point', x: 4, value: 2, action: 'temporary' }]
			})
		);
		const r = runCheck(file);
		expect(r.code).toBe(0);
		// Cantilever tip load: W = Mp/L (Neal) → λ = 40/(4 · 2 · 1.5) = 3.333 with γ temporary 1.5.
		expect(r.out).toContain('load factor λ = 3.333');
		// The verdict and the governing answer come first; λ is labelled as the partial result it is.
		expect(r.out.indexOf('Verdict: PASS')).toBeLessThan(r.out.indexOf('load factor λ'));
		expect(r.out).toContain('Largest proposed load: 6.67 kN (load 1)'); // Mp/(L·γ) = 40/(4·1.5)
		expect(r.out).toContain('Plastic collapse in bending (partial result');
		expect(r.out).toContain('Screening aid only.');
	});

	describe('--units', () => {
		// The same cantilever; 1 kip = 4.448 222 kN, 1 ft = 0.3048 m (NIST SP 811, Appendix B).
		const KIP_KN = 0.45359237 * 9.80665;
		const FT_M = 0.3048;
		const cantilever = (extra: Record<string, unknown> = {}) => {
			const dir = mkdtempSync(join(tmpdir(), 'hp-units-'));
			const file = join(dir, 'case.json');
			writeFileSync(
				file,
				JSON.stringify({
					format: 'hingepoint.case',
					version: 1,
					title: 'DEMO — invented cantilever',
					...extra,
					beam: {
						spans: [4],
						supports: ['fixed', 'free'],
						section: { designation: 'UB 254x146x31' },
						grade: 'S275',
						restraint: { lateral: [4] }
					},
					loads: [{ kind: 'point', x: 4, value: 2, action: 'temporary' }]
				})
			);
			return file;
		};
		const SI_WORDS = /kN|kNm|MPa|N\/mm|\bmm\b|\d m\b/;

		it('writes every figure and word in US customary units with --units us', () => {
			const si = runCheck(cantilever());
			const us = runCheck(cantilever(), '--units', 'us');
			expect(si.code).toBe(0);
			expect(us.code).toBe(0);
			expect(si.out).toMatch(SI_WORDS);
			// Everything but the user's own title.
			const body = us.out.split('\n').slice(1).join('\n');
			expect(body).not.toMatch(SI_WORDS);
			expect(body).toContain('Units: US customary');
			const kN = Number(/largest proposed load: ([\d.]+) kN/.exec(si.out)![1]);
			const kip = Number(/largest proposed load: ([\d.]+) kip/.exec(us.out)![1]);
			// Both printed to 3 significant figures from the same SI value.
			expect(Math.abs(kip - kN / KIP_KN) / kip).toBeLessThan(0.01);
			expect(us.out).toContain(`at ${Number((4 / FT_M).toPrecision(4))} ft`);
		});

		it("reads the case's own units when no option is given, and the option wins", () => {
			const file = cantilever({ units: 'us' });
			expect(runCheck(file).out).toContain('Units: US customary');
			expect(runCheck(file, '--units=si').out).toContain('Units: SI');
			expect(runCheck(cantilever()).out).toContain('Units: SI');
		});

		it('keeps the JSON numbers in SI and says the words are in US units', () => {
			const si = JSON.parse(runCheck(cantilever(), '--json').out);
			const us = JSON.parse(runCheck(cantilever(), '--json', '--units', 'us').out);
			expect(us.textUnits).toBe('us');
			expect(si.textUnits).toBe('si');
			expect(us.units).toEqual(si.units);
			expect(us.answer.allowable).toEqual(si.answer.allowable);
			expect(us.answer.message).not.toMatch(SI_WORDS);
		});

		it('refuses units it does not know', () => {
			const r = runCheck(cantilever(), '--units', 'imperial', '--json');
			expect(r.code).toBe(2);
			expect(JSON.parse(r.out).errors[0].message).toMatch(/--units takes si or us/);
		});
	});

	describe('on an AISC basis', () => {
		/** The US walk of issue 11: W12x26 A992, 20 ft, 2 kip at midspan, held only at the ends. */
		const usWalk = (basis: string) => {
			const dir = mkdtempSync(join(tmpdir(), 'hp-aisc-'));
			const file = join(dir, 'case.json');
			writeFileSync(
				file,
				JSON.stringify({
					format: 'hingepoint.case',
					version: 1,
					title: 'DEMO — invented US walk',
					basis,
					units: 'us',
					beam: {
						spans: [20],
						supports: ['pin', 'pin'],
						section: { designation: 'W12x26' },
						grade: 'A992',
						restraint: { lateral: 'ends-only' }
					},
					loads: [{ kind: 'point', x: 10, value: 2, action: 'temporary' }]
				})
			);
			return file;
		};
		// W12x26: bf = 6.49 in, tf = 0.380 in, h/tw = 47.2 (AISC Shapes Database v15.0);
		// AISC 360-22 Table B4.1b cases 10 and 15: λp = 0.38√(E/Fy) flange, 3.76√(E/Fy) web.
		const flangeCompact = 6.49 / (2 * 0.38) <= 0.38 * Math.sqrt(29000 / 50);
		const webCompact = 47.2 <= 3.76 * Math.sqrt(29000 / 50);

		it("names the span's section rank in AISC words, never as an EN 1993-1-1 class", () => {
			expect(flangeCompact && webCompact).toBe(true);
			for (const basis of ['aisc-lrfd', 'aisc-asd']) {
				for (const units of ['us', 'si']) {
					const r = runCheck(usWalk(basis), '--units', units);
					expect(r.code).toBe(0);
					const span = r.out.split('\n').find((l) => l.startsWith('Span 1:')) ?? '';
					expect(span).toMatch(/W12x26, ASTM A992, fy .*, compact/);
					// EN 1993-1-1 Table 5.2 class words and partial factors have no place here.
					expect(r.out).not.toMatch(/Class [1-4]|γM|EN 1993/);
				}
			}
		});
	});
});
