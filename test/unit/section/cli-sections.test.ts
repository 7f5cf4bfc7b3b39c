/**
 * The `sections` and `section` commands, run as a user would (npx tsx src/cli/main.ts …):
 * exit codes 0 / 2 and the JSON shape other tools rely on.
 */
import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { listSections } from '../../../src/lib/engine/section/index';

function runCli(...args: string[]) {
	const r = spawnSync('npx', ['tsx', 'src/cli/main.ts', ...args], {
		encoding: 'utf8',
		timeout: 60_000
	});
	return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

interface SectionJson {
	designation: string;
	family: string;
	standard: string;
	shape: string;
	dims: Record<string, number>;
	props: Record<string, number>;
}

const PROP_KEYS = ['A', 'mass', 'Iy', 'Iz', 'Wely', 'Wply', 'Welz', 'Wplz', 'It', 'Iw', 'Avz'];
const DIM_KEYS: Record<string, string[]> = {
	I: ['h', 'b', 'tw', 'tf', 'r'],
	RHS: ['h', 'b', 't', 'ro', 'ri'],
	CHS: ['d', 't']
};

describe('hingepoint sections --json', () => {
	it('prints every library section with designation, family, standard, shape, dims and props', () => {
		const { code, stdout } = runCli('sections', '--json');
		expect(code).toBe(0);
		const list = JSON.parse(stdout) as SectionJson[];
		expect(list.length).toBeGreaterThan(300);
		const families = new Set(list.map((s) => s.family));
		expect([...families].sort()).toEqual([
			'CFCHS',
			'CFRHS',
			'CFSHS',
			'CHS',
			'HEA',
			'HEB',
			'HEM',
			'HP',
			'HSS',
			'IPE',
			'PIPE',
			'RHS',
			'S',
			'SHS',
			'UB',
			'UC',
			'W'
		]);
		for (const s of list) {
			expect(typeof s.designation).toBe('string');
			expect(typeof s.standard).toBe('string');
			// S shapes (tapered flanges) add their flange slope to the I dims.
			const keys = Object.keys(s.dims).filter((k) => !(s.family === 'S' && k === 'slope'));
			expect(keys.sort()).toEqual([...DIM_KEYS[s.shape]].sort());
			for (const k of PROP_KEYS) expect(Number.isFinite(s.props[k])).toBe(true);
		}
	});
});

describe('hingepoint section "<designation>"', () => {
	it('prints one section as JSON and exits 0', () => {
		const { code, stdout } = runCli('section', '305 x 165 x 40 UB', '--json');
		expect(code).toBe(0);
		const s = JSON.parse(stdout);
		expect(s).toMatchObject({ designation: 'UB 305x165x40', family: 'UB', shape: 'I' });
		expect(s.dims).toEqual({ h: 303.4, b: 165, tw: 6, tf: 10.2, r: 8.9 });
		expect(s.props.Wply).toBeGreaterThan(600e3);
	});

	it('exits 2 and names the nearest designations for an unknown name', () => {
		const { code, stdout, stderr } = runCli('section', 'UB 305x165x41', '--json');
		expect(code).toBe(2);
		expect(stdout).toBe('');
		expect(stderr).toMatch(/UB 305x165x40/);
	});

	it('prints a readable summary without --json', () => {
		const { code, stdout } = runCli('section', 'HE 300 B');
		expect(code).toBe(0);
		expect(stdout).toMatch(/HEB 300/);
		expect(stdout).toMatch(/Wply .* cm³/);
	});
});

/**
 * The families the tables must hold: issue 11 §5 names W, HP, S, HSS (rectangular, square,
 * round) and pipe (ASTM A6 / A500 / A53), HE A/B/M, UB, UC, IPE (EN 10365, BS 4-1) and the
 * EN 10210-2 / EN 10219-2 hollow sections.
 */
const NAMED_FAMILIES = [
	'W',
	'HP',
	'S',
	'HSS',
	'PIPE',
	'HEA',
	'HEB',
	'HEM',
	'UB',
	'UC',
	'IPE',
	'SHS',
	'RHS',
	'CHS',
	'CFSHS',
	'CFRHS',
	'CFCHS'
];

describe('hingepoint sections --family', () => {
	it('the usage lists exactly the families the tables hold, each named in issue 11', () => {
		const { code, stderr } = runCli();
		expect(code).toBe(0);
		const line = stderr.split('\n').find((l) => l.trim().startsWith('sections'));
		const listed = /--family ([A-Z|]+)/.exec(line ?? '')?.[1].split('|') ?? [];
		const inTables = [...new Set(listSections().map((s) => s.family))];
		expect([...listed].sort()).toEqual([...inTables].sort());
		expect([...listed].sort()).toEqual([...NAMED_FAMILIES].sort());
	});

	it('an unknown family exits 2 and lists every family with its shapes and standard', () => {
		const { code, stderr } = runCli('sections', '--family', 'HEX');
		expect(code).toBe(2);
		for (const family of NAMED_FAMILIES) expect(stderr).toMatch(new RegExp(`^  ${family} `, 'm'));
		// AISC Shapes Database v15.0: HSS holds rectangular, square and round tubes.
		expect(stderr).toMatch(/HSS .*rectangular\/square hollow, round hollow/);
	});

	it('reads a cold-formed family as typed with its space', () => {
		const { code, stdout } = runCli('sections', '--family', 'cf shs');
		expect(code).toBe(0);
		const rows = stdout.split('\n').filter((l) => l.startsWith('CF SHS '));
		expect(rows.length).toBe(listSections().filter((s) => s.family === 'CFSHS').length);
		expect(rows.length).toBeGreaterThan(0);
	});
});
