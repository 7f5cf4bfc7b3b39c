import type { Checked, InputIssue } from '../model/issue';
import type { GradeSpec, SteelGrade } from './types';
import { GRADE_ROWS } from './grade-table';
import { HISTORIC_GRADE_ROWS } from './historic-grades';
import { REFUSED_MATERIALS, explainRefusedMaterial } from './refused';

export type { GradeSpec, SteelGrade } from './types';

/** Current grades first, then historic ones. */
const ALL_ROWS = [...GRADE_ROWS, ...HISTORIC_GRADE_ROWS];

/** Turns the way people write grades (`s275jr`, `A572 Gr 50`, `astm a992`) into a library id. */
function normaliseGradeId(text: string): string {
	const t = text
		.trim()
		.toLowerCase()
		.replace(/^astm\s*/, '');
	const en = t.match(/^s\s?(235|275|355|460)/);
	if (en) return `S${en[1]}`;
	if (/^a\s?572/.test(t)) return 'A572-50';
	const astm = t.match(/^a\s?(36|992)$/);
	if (astm) return `A${astm[1]}`;
	return t.replace(/[\s_]+/g, '-');
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
export function resolveGrade(spec: GradeSpec, thickness: number): Checked<SteelGrade> {
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
	const band = row.bands.find((b) => thickness <= b.upTo);
	if (!band) {
		const top = row.bands[row.bands.length - 1].upTo;
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
	const confirm = `${row.name}: fy = ${band.fy} N/mm² is a lower-bound default. ${row.note ?? ''}`;
	const warnings = value.needsConfirmation
		? [makeIssue('', 'grade-needs-confirmation', confirm.trim(), 'warning')]
		: [];
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

/**
 * The grades for a picker, refused materials last (choosing one explains the refusal).
 * @example listGrades()[0] // { id: 'S235', name: 'S235 (EN 10025-2)', …, refused: false }
 */
export function listGrades(): GradeChoice[] {
	const grades = ALL_ROWS.map((g) => ({
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
