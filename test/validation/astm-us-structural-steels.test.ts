/**
 * US structural steels: minimum yield Fy and the lower end of the tensile range Fu, as the ASTM
 * product standards give them and AISC Steel Construction Manual Table 2-4 summarises:
 * ASTM A992 (W shapes) 50 / 65 ksi; ASTM A36 36 / 58 ksi; ASTM A572 Grade 50 50 / 65 ksi;
 * ASTM A500 HSS Grade B 46 / 58 ksi rectangular, 42 / 58 ksi round, Grade C 50 / 62 ksi
 * rectangular, 46 / 62 ksi round; ASTM A1085 Grade A 50 / 65 ksi; ASTM A53 Grade B pipe
 * 35 / 60 ksi. A992, A36, A500 Gr C and A53 Gr B confirmed against a quotation of the Manual's
 * summary; A572 Gr 50, A500 Gr B, A1085 from memory. Historic: ASTM A7 / A9 1924–1938 yield
 * ≥ 30 ksi (quotation of AISC "Iron and Steel Beams 1873 to 1952", p. 7); A7-39 onward 33 ksi
 * (quoted requirements); A7 / A9 1900–1923, A373 and A441 from memory of AISC Design Guide 15.
 * Moduli: AISC 360-22 Symbols E = 29 000 ksi, G = 11 200 ksi (from memory).
 * ksi → MPa by NIST SP 811 Appendix B: 1 ksi = 6.894 757 MPa (1 lbf = 4.448 221 615 260 5 N,
 * 1 in = 25.4 mm).
 */
import { describe, expect, it } from 'vitest';
import {
	AISC_MODULI,
	EUROCODE_MODULI,
	listGrades,
	resolveGrade,
	type GradeProduct
} from '../../src/lib/engine/material/index';
import { CASE_FORMAT, CASE_VERSION, parseCase } from '../../src/lib/engine/case/index';

const MPA_PER_KSI = 4448.2216152605 / 25.4 ** 2;
const ksi = (v: number) => v * MPA_PER_KSI;
const rel = (a: number, b: number) => Math.abs(a / b - 1);

/** [id as written, product, Fy ksi, Fu ksi, source tag] */
const CURRENT: [string, GradeProduct, number, number, string][] = [
	['A992', 'open', 50, 65, 'ASTM A992; AISC Manual Table 2-4'],
	['A36', 'open', 36, 58, 'ASTM A36; AISC Manual Table 2-4'],
	['A572 Gr 50', 'open', 50, 65, 'ASTM A572 Grade 50 (from memory)'],
	['A500 Grade B', 'rectangular-hollow', 46, 58, 'ASTM A500 Gr B shaped (from memory)'],
	['A500 Grade B', 'round-hollow', 42, 58, 'ASTM A500 Gr B round (from memory)'],
	['A500 Gr C', 'rectangular-hollow', 50, 62, 'ASTM A500 Gr C shaped; AISC Manual Table 2-4'],
	['A500-C', 'round-hollow', 46, 62, 'ASTM A500 Gr C round; AISC Manual Table 2-4'],
	['A1085', 'rectangular-hollow', 50, 65, 'ASTM A1085 Gr A (from memory)'],
	['A1085', 'round-hollow', 50, 65, 'ASTM A1085 Gr A (from memory)'],
	['ASTM A53 Grade B', 'round-hollow', 35, 60, 'ASTM A53 Gr B; AISC Manual Table 2-4']
];

describe('current US grades against the ASTM minimums', () => {
	it.each(CURRENT)('%s (%s): Fy %d ksi, Fu %d ksi — %s', (id, product, fy, fu) => {
		const r = resolveGrade(id, 10, { product });
		if (!r.ok) throw new Error(JSON.stringify(r.issues));
		expect(rel(r.value.fy, ksi(fy))).toBeLessThan(1e-9);
		expect(rel(r.value.fu!, ksi(fu))).toBeLessThan(1e-9);
		expect(r.value.needsConfirmation).toBe(false);
		expect(r.warnings).toEqual([]);
	});

	it('A992 meets the EN 1993-1-1 3.2.2 ductility ratio used by the hinge check (65/50 ≥ 1.10)', () => {
		const r = resolveGrade('A992', 20, { product: 'open' });
		expect(r.ok && r.value.fu! / r.value.fy).toBeGreaterThanOrEqual(1.1);
	});

	it('a tube grade on an open section is flagged, not silently used', () => {
		const r = resolveGrade('A500-C', 10, { product: 'open' });
		expect(r.ok && r.warnings.map((w) => w.code)).toEqual(['grade-not-for-product']);
	});
});

describe('older US steels (rehabilitation guidance), each a default to confirm', () => {
	it.each([
		['A9-1900', 27.5, 'DG15, from memory'],
		['A7-1924', 30, 'Iron and Steel Beams 1873 to 1952, p. 7'],
		['A7', 33, 'ASTM A7-39 requirements'],
		['A373', 32, 'from memory']
	])('%s: Fy %d ksi (%s)', (id, fy) => {
		const r = resolveGrade(id, 15);
		if (!r.ok) throw new Error(JSON.stringify(r.issues));
		expect(rel(r.value.fy, ksi(fy))).toBeLessThan(1e-9);
		expect(r.value.needsConfirmation).toBe(true);
		expect(r.warnings.map((w) => w.code)).toContain('grade-needs-confirmation');
	});

	it('A441 steps down with thickness: 50, 46, 42, 40 ksi to ¾, 1½, 4 and 8 in (from memory)', () => {
		const fy = [0.5, 1, 3, 6].map((tIn) => {
			const r = resolveGrade('A441', tIn * 25.4);
			if (!r.ok) throw new Error(JSON.stringify(r.issues));
			return r.value.fy / MPA_PER_KSI;
		});
		fy.forEach((v, i) => expect(rel(v, [50, 46, 42, 40][i])).toBeLessThan(1e-9));
	});
});

describe('cast and wrought iron are refused on the US side too', () => {
	it('the US picker lists US grades and ends with the refused irons', () => {
		const list = listGrades({ region: 'us' });
		const ids = list.map((g) => g.id);
		expect(ids.slice(-2)).toEqual(['cast-iron', 'wrought-iron']);
		expect(ids).toEqual(expect.arrayContaining(['A992', 'A36', 'A7', 'unknown-old']));
		expect(ids).not.toContain('S275');
		expect(list.slice(-2).every((g) => g.refused)).toBe(true);
	});

	it('the picker for round tubes offers only round-tube grades among the current US ones', () => {
		const ids = listGrades({ region: 'us', product: 'round-hollow' }).map((g) => g.id);
		expect(ids).toEqual(expect.arrayContaining(['A500-B', 'A500-C', 'A1085', 'A53-B']));
		expect(ids).not.toContain('A992');
	});

	it.each(['cast-iron', 'wrought-iron'])('a US case in %s is refused with the reason', (grade) => {
		const r = parseCase({
			format: CASE_FORMAT,
			version: CASE_VERSION,
			basis: 'aisc-lrfd',
			units: 'us',
			beam: {
				spans: [20],
				supports: ['pin', 'pin'],
				section: { shape: 'I', h: 12, b: 6, tw: 0.25, tf: 0.4, r: 0.3 },
				grade
			},
			loads: [{ kind: 'point', x: 10, value: 2, action: 'temporary' }]
		});
		expect(r.ok).toBe(false);
		if (r.ok) return;
		expect(r.issues.map((i) => `${i.path}:${i.code}`)).toEqual(['beam.grade:material-not-ductile']);
		expect(r.issues[0].message).toMatch(/elastically/);
	});
});

describe('moduli by basis', () => {
	it('AISC: E = 29 000 ksi = 199 948 MPa, G = 11 200 ksi (AISC 360-22 Symbols, from memory)', () => {
		expect(rel(AISC_MODULI.E, ksi(29_000))).toBeLessThan(1e-12);
		expect(Math.round(AISC_MODULI.E)).toBe(199_948);
		expect(rel(AISC_MODULI.G, ksi(11_200))).toBeLessThan(1e-12);
	});

	it('Eurocode: E = 210 000 MPa (EN 1993-1-1 3.2.6)', () => {
		expect(EUROCODE_MODULI.E).toBe(210_000);
	});
});
