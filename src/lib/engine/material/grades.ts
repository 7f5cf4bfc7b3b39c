import type { Checked, InputIssue } from '../model/issue';
import type {
	GradeBand,
	GradeProduct,
	GradeRegion,
	GradeRow,
	GradeSpec,
	SteelGrade
} from './types';
import { GRADE_ROWS } from './grade-table';
import { HISTORIC_GRADE_ROWS } from './historic-grades';
import { US_HISTORIC_GRADE_ROWS } from './us-historic-grades';
import { REFUSED_MATERIALS, explainRefusedMaterial } from './refused';

export type { GradeSpec, SteelGrade } from './types';

/** Current grades first, then historic ones. */
const ALL_ROWS = [...GRADE_ROWS, ...HISTORIC_GRADE_ROWS, ...US_HISTORIC_GRADE_ROWS];

/**
 * Turns the way people write grades (`s275jr`, `A572 Gr 50`, `astm a992`, `A500 Grade C`) into a
 * library id.
 */
function normaliseGradeId(text: string): string {
	const t = text
		.trim()
		.toLowerCase()
		.replace(/^astm\s*/, '');
	const en = t.match(/^s\s?(235|275|355|460)/);
	if (en) return `S${en[1]}`;
	if (/^a\s?572/.test(t)) return 'A572-50';
	if (/^a\s?1085/.test(t)) return 'A1085';
	const grade = t.match(/^a\s?(500|53)[\s_-]*(?:gr(?:ade)?\.?)?[\s_-]*([bc])$/);
	if (grade) return `A${grade[1]}-${grade[2].toUpperCase()}`;
	if (/^a\s?53$/.test(t)) return 'A53-B';
	const astm = t.match(/^a\s?(36|992|7|373|441)$/);
	if (astm) return `A${astm[1]}`;
	return t.replace(/[\s_]+/g, '-');
}

/** Options of {@link resolveGrade}. */
export interface GradeOptions {
	/** Product form of the section: picks the round-HSS values and warns on a foreign product. */
	product?: GradeProduct;
}

/** The warning for a grade whose standard does not cover the product form. */
function checkProduct(row: GradeRow, product: GradeProduct | undefined): InputIssue[] {
	if (!product || !row.products || row.products.includes(product)) return [];
	const words: Record<GradeProduct, string> = {
		open: 'an open section',
		'rectangular-hollow': 'a rectangular hollow section',
		'round-hollow': 'a round hollow section'
	};
	const message =
		`${row.name} is not a standard for ${words[product]}: check the grade ` +
		'(the strengths used are those of the standard as named).';
	return [makeIssue('', 'grade-not-for-product', message, 'warning')];
}

/** Builds one issue. */
function makeIssue(
	path: string,
	code: string,
	message: string,
	severity: 'error' | 'warning' = 'error'
): InputIssue {
	return { path, code, message, severity };
}

/** Resolves a user-entered fy (and optional fu), N/mm². */
function resolveOwnValues(spec: { fy: number; fu?: number }): Checked<SteelGrade> {
	const issues: InputIssue[] = [];
	if (!Number.isFinite(spec.fy) || spec.fy <= 0 || spec.fy > 1000) {
		const message = 'fy must be a yield strength between 0 and 1000 N/mm².';
		issues.push(makeIssue('fy', 'fy-not-valid', message));
	}
	if (spec.fu !== undefined && (!Number.isFinite(spec.fu) || spec.fu < spec.fy)) {
		issues.push(makeIssue('fu', 'fu-not-valid', 'fu must be a number not less than fy (N/mm²).'));
	}
	if (issues.length > 0) return { ok: false, issues };
	const fu = spec.fu ?? null;
	// EN 1993-1-1 3.2.2(1) recommended ductility: fu/fy ≥ 1.10.
	const ductile = fu === null || fu / spec.fy >= 1.1;
	const warnings = ductile
		? []
		: [
				makeIssue(
					'fu',
					'steel-not-ductile',
					'fu/fy is below 1.10 (EN 1993-1-1 3.2.2): plastic hinges may not be relied on.',
					'warning'
				)
			];
	const value: SteelGrade = {
		id: 'user',
		name: `User-entered fy = ${spec.fy} N/mm²`,
		fy: spec.fy,
		fu,
		standard: 'Entered by the user',
		source: '[user]',
		ductile,
		needsConfirmation: false
	};
	if (fu === null) value.note = 'fu not given: ductility (fu/fy ≥ 1.10) could not be checked.';
	return { ok: true, value, warnings };
}

/**
 * Resolves a grade for the governing thickness t (mm): fy and fu step down with thickness as the
 * product standard gives them. Cast and wrought iron are refused with the reason. Issue paths
 * are '' (the grade field itself) or `fy` / `fu`; the caller prefixes them.
 * @example resolveGrade('S355', 19) // ok, fy 345 (EN 10025-2 Table 7, 16 < t ≤ 40)
 * @example resolveGrade('cast-iron', 20) // not ok: issue 'material-not-ductile'
 */
export function resolveGrade(
	spec: GradeSpec,
	thickness: number,
	options: GradeOptions = {}
): Checked<SteelGrade> {
	if (typeof spec !== 'string') return resolveOwnValues(spec);
	const id = normaliseGradeId(spec);
	const refused = explainRefusedMaterial(id);
	if (refused) return { ok: false, issues: [refused] };
	const row = ALL_ROWS.find((g) => g.id.toLowerCase() === id.toLowerCase());
	if (!row) {
		const known = ALL_ROWS.map((g) => g.id).join(', ');
		const message = `Unknown grade "${spec}". Known: ${known}; or give fy.`;
		return { ok: false, issues: [makeIssue('', 'grade-unknown', message)] };
	}
	if (!Number.isFinite(thickness) || thickness < 0) {
		throw new Error(`invariant: governing thickness must be finite and ≥ 0, got ${thickness}`);
	}
	const bands: readonly GradeBand[] =
		options.product === 'round-hollow' && row.roundBands ? row.roundBands : row.bands;
	const band = bands.find((b) => thickness <= b.upTo);
	if (!band) {
		const top = Number(bands[bands.length - 1].upTo.toFixed(1));
		const message =
			`${row.name} is specified only up to ${top} mm thick; ` + `this element is ${thickness} mm.`;
		return { ok: false, issues: [makeIssue('', 'thickness-beyond-grade', message)] };
	}
	const value: SteelGrade = {
		id: row.id,
		name: row.name,
		fy: band.fy,
		fu: band.fu,
		standard: row.standard,
		source: row.source,
		ductile: true,
		needsConfirmation: row.needsConfirmation ?? false
	};
	if (row.note) value.note = row.note;
	const shown = Number(band.fy.toFixed(1));
	const confirm = `${row.name}: fy = ${shown} N/mm² is a lower-bound default. ${row.note ?? ''}`;
	const warnings = value.needsConfirmation
		? [makeIssue('', 'grade-needs-confirmation', confirm.trim(), 'warning')]
		: [];
	warnings.push(...checkProduct(row, options.product));
	return { ok: true, value, warnings };
}

/** One entry of the grade picker. */
export interface GradeChoice {
	id: string;
	name: string;
	standard: string;
	/** Refused for plastic analysis (iron); choosing it shows the reason. */
	refused: boolean;
}

/** Options of {@link listGrades}: without them every grade is listed. */
export interface GradeListOptions {
	/** Only the grades of this basis's region (and those of any region). */
	region?: Exclude<GradeRegion, 'any'>;
	/** Only the grades whose standard covers this product form. */
	product?: GradeProduct;
}

/**
 * The grades for a picker, refused materials last (choosing one explains the refusal).
 * @example listGrades()[0] // { id: 'S235', name: 'S235 (EN 10025-2)', …, refused: false }
 * @example listGrades({ region: 'us', product: 'round-hollow' })[0].id // 'A500-B'
 */
export function listGrades(options: GradeListOptions = {}): GradeChoice[] {
	const inRegion = (g: GradeRow) =>
		!options.region || (g.region ?? 'any') === 'any' || g.region === options.region;
	const forProduct = (g: GradeRow) =>
		!options.product || !g.products || g.products.includes(options.product);
	const rows = ALL_ROWS.filter((g) => inRegion(g) && forProduct(g));
	const grades = rows.map((g) => ({
		id: g.id,
		name: g.name,
		standard: g.standard,
		refused: false
	}));
	const refused = Object.entries(REFUSED_MATERIALS).map(([id, m]) => ({
		id,
		name: m.name,
		standard: '—',
		refused: true
	}));
	return [...grades, ...refused];
}
