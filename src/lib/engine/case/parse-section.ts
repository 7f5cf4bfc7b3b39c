/**
 * Reads the section(s) and grade of a case file through the section and grade libraries, and
 * rewrites their issue paths to case-file paths (`beam.section.tf`, `beam.grade`).
 */
import { resolveGrade } from '../material/grades';
import type { GradeProduct, SteelGrade } from '../material/types';
import type { InputIssue } from '../model/issue';
import { designWallFactor } from '../section/hss-wall';
import { resolveSection } from '../section/resolve';
import type { ResolvedSection, SectionSpec } from '../section/types';
import { RANGES, SIZE_LIMITS } from './limits';
import { addError, isRecord, readNumber, readText, warnUnknownKeys } from './read-value';

/** The keys each shape reads; `r` is the root radius of a rolled I. */
export const SHAPE_KEYS: Record<string, readonly string[]> = {
	I: ['h', 'b', 'tw', 'tf', 'r'],
	'welded-I': ['h', 'b', 'tw', 'tf'],
	RHS: ['h', 'b', 't'],
	CHS: ['d', 't'],
	flat: ['h', 'b']
};
const SHAPES = Object.keys(SHAPE_KEYS);

/** Sections and grades, one per span. */
export interface SpanMaterials {
	sections: ResolvedSection[];
	grades: (SteelGrade | null)[];
}

/** Errors so far (warnings may share the list). */
function countErrors(issues: InputIssue[]): number {
	return issues.filter((i) => i.severity === 'error').length;
}

/** Prefixes library issue paths (`tf`, `loss`, '') with the case path. */
function relocate(list: InputIssue[], base: string): InputIssue[] {
	return list.map((issue) => ({
		...issue,
		path: issue.path === 'loss' ? 'beam.sectionLoss' : issue.path ? `${base}.${issue.path}` : base
	}));
}

/** Checks the outer form of a section entry before the library reads it. */
function checkSpecForm(
	raw: unknown,
	path: string,
	issues: InputIssue[],
	warnings: InputIssue[]
): raw is SectionSpec {
	if (!isRecord(raw)) {
		const message = 'Give the section: {"designation": …}, a shape with dimensions, or {"mp": …}.';
		addError(issues, path, 'section-missing', message);
		return false;
	}
	const before = countErrors(issues);
	if ('designation' in raw) {
		warnUnknownKeys(raw, ['designation'], path, warnings);
		if (typeof raw.designation === 'string') {
			const rule = { label: 'designation', max: SIZE_LIMITS.designation };
			return readText(raw.designation, `${path}.designation`, issues, rule) !== undefined;
		}
		const message = 'The designation must be text, e.g. "UB 305x165x40".';
		addError(issues, `${path}.designation`, 'not-a-string', message);
		return false;
	}
	if ('mp' in raw) {
		warnUnknownKeys(raw, ['mp', 'mass'], path, warnings);
		readNumber(raw.mp, `${path}.mp`, issues, { label: 'Mp (kNm)', range: RANGES.mp });
		if (raw.mass !== undefined) {
			readNumber(raw.mass, `${path}.mass`, issues, { label: 'mass (kg/m)', range: RANGES.mass });
		}
		return countErrors(issues) === before;
	}
	const shape = typeof raw.shape === 'string' ? raw.shape : '';
	if (!Object.hasOwn(SHAPE_KEYS, shape)) {
		const message = `The shape must be one of: ${SHAPES.join(', ')}.`;
		addError(issues, `${path}.shape`, 'not-one-of', message);
		return false;
	}
	const keys = SHAPE_KEYS[shape];
	const known = ['shape', ...keys, ...(shape === 'RHS' ? ['process'] : [])];
	warnUnknownKeys(raw, known, path, warnings);
	for (const key of keys) {
		// A missing dimension is reported by the section library, which knows what each one is.
		if (raw[key] === undefined) continue;
		const range = key === 'r' ? RANGES.radius : RANGES.dimension;
		readNumber(raw[key], `${path}.${key}`, issues, { label: `${key} (mm)`, range });
	}
	if (raw.process !== undefined && typeof raw.process !== 'string') {
		addError(issues, `${path}.process`, 'not-one-of', 'process must be "hot" or "cold".');
	}
	return countErrors(issues) === before;
}

/**
 * Resolves the section entry (one, or one per span) and the grade for each span's governing
 * thickness. Warnings go to `warnings`, errors to `issues`.
 */
export function parseSections(
	beam: Record<string, unknown>,
	spanCount: number | undefined,
	loss: number,
	issues: InputIssue[],
	warnings: InputIssue[]
): SpanMaterials | undefined {
	const raw = beam.section;
	const perSpan = Array.isArray(raw);
	if (perSpan && (spanCount ?? SIZE_LIMITS.spans) < raw.length) {
		const message = `Give one section for the beam or one per span (at most ${SIZE_LIMITS.spans}).`;
		addError(issues, 'beam.section', 'wrong-length', message);
		return undefined;
	}
	if (perSpan && spanCount !== undefined && raw.length !== spanCount) {
		const message = `Give one section for the beam or one per span (${spanCount}).`;
		addError(issues, 'beam.section', 'wrong-length', message);
		return undefined;
	}
	const entries: unknown[] = perSpan ? raw : [raw];
	const resolved: ResolvedSection[] = [];
	entries.forEach((spec, i) => {
		const path = perSpan ? `beam.section[${i}]` : 'beam.section';
		if (!checkSpecForm(spec, path, issues, warnings)) return;
		const r = resolveSection(spec, { loss });
		if (!r.ok) return void issues.push(...relocate(r.issues, path));
		warnings.push(...relocate(r.warnings, path));
		resolved.push(r.value);
	});
	if (resolved.length !== entries.length || spanCount === undefined) return undefined;
	const sections = perSpan ? resolved : new Array<ResolvedSection>(spanCount).fill(resolved[0]);
	const grades = resolveGrades(beam.grade, sections, issues, warnings);
	if (!grades) return undefined;
	const walled = applyGradeWalls(entries as SectionSpec[], perSpan, sections, grades, {
		loss,
		issues
	});
	return walled ? { sections: walled, grades } : undefined;
}

/**
 * US tubes on the design wall of their grade (AISC 360-22 B4.2): the tables carry 0.93 × nominal
 * (ASTM A500 and A53, ERW); an A1085 tube is read again on its nominal wall. One section entry
 * for the whole beam stays one object.
 */
function applyGradeWalls(
	entries: SectionSpec[],
	perSpan: boolean,
	sections: ResolvedSection[],
	grades: (SteelGrade | null)[],
	{ loss, issues }: { loss: number; issues: InputIssue[] }
): ResolvedSection[] | undefined {
	const again = new Map<number, ResolvedSection>();
	const out: ResolvedSection[] = [];
	for (const [i, section] of sections.entries()) {
		const gradeId = grades[i]?.id;
		const { nominalWall, designWall } = section;
		const wanted =
			nominalWall === undefined || gradeId === undefined
				? designWall
				: nominalWall * designWallFactor(gradeId);
		if (wanted === undefined || Math.abs(wanted - (designWall ?? 0)) < 1e-9) {
			out.push(section);
			continue;
		}
		const k = perSpan ? i : 0;
		if (!again.has(k)) {
			const r = resolveSection(entries[k], { loss, gradeId });
			const path = perSpan ? `beam.section[${k}]` : 'beam.section';
			if (!r.ok) return void issues.push(...relocate(r.issues, path));
			again.set(k, r.value);
		}
		out.push(again.get(k)!);
	}
	return out;
}

/** Length of a grade name; range of own fy and fu (MPa), before the grade library reads them. */
function checkGradeForm(
	spec: string | Record<string, unknown>,
	issues: InputIssue[],
	warnings: InputIssue[]
): boolean {
	if (typeof spec === 'string') {
		const rule = { label: 'grade name', max: SIZE_LIMITS.gradeName };
		return readText(spec, 'beam.grade', issues, rule) !== undefined;
	}
	warnUnknownKeys(spec, ['fy', 'fu'], 'beam.grade', warnings);
	const before = countErrors(issues);
	readNumber(spec.fy, 'beam.grade.fy', issues, { label: 'fy (MPa)', range: RANGES.fy });
	if (spec.fu !== undefined) {
		readNumber(spec.fu, 'beam.grade.fu', issues, { label: 'fu (MPa)', range: RANGES.fu });
	}
	return countErrors(issues) === before;
}

/** The product form a grade standard is written for: round and rectangular tubes, or the rest. */
function productOf(section: ResolvedSection): GradeProduct | undefined {
	if (section.shape === 'CHS') return 'round-hollow';
	if (section.shape === 'RHS') return 'rectangular-hollow';
	return section.shape === 'known-mp' ? undefined : 'open';
}

function resolveGrades(
	spec: unknown,
	sections: ResolvedSection[],
	issues: InputIssue[],
	warnings: InputIssue[]
): (SteelGrade | null)[] | undefined {
	const needed = sections.some((s) => s.shape !== 'known-mp');
	if (spec === undefined) {
		if (!needed) return sections.map(() => null);
		const message = 'Give the steel grade (e.g. "S275") or {"fy": …} in MPa.';
		addError(issues, 'beam.grade', 'grade-missing', message);
		return undefined;
	}
	if (typeof spec !== 'string' && !(isRecord(spec) && 'fy' in spec)) {
		const message = 'The grade must be a name such as "S275" or {"fy": 275}.';
		addError(issues, 'beam.grade', 'grade-not-valid', message);
		return undefined;
	}
	if (!checkGradeForm(spec, issues, warnings)) return undefined;
	const out: (SteelGrade | null)[] = [];
	for (const section of sections) {
		const gradeSpec = spec as string | { fy: number; fu?: number };
		const r = resolveGrade(gradeSpec, section.governingThickness, {
			product: productOf(section)
		});
		if (!r.ok) {
			issues.push(...relocate(r.issues, 'beam.grade'));
			return undefined;
		}
		for (const w of relocate(r.warnings, 'beam.grade')) {
			if (!warnings.some((x) => x.code === w.code && x.path === w.path)) warnings.push(w);
		}
		out.push(r.value);
	}
	return out;
}
