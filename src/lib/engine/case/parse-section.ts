/**
 * Reads the section(s) and grade of a case file through the section and grade libraries, and
 * rewrites their issue paths to case-file paths (`beam.section.tf`, `beam.grade`).
 */
import { resolveGrade } from '../material/grades';
import type { SteelGrade } from '../material/types';
import type { InputIssue } from '../model/issue';
import { resolveSection } from '../section/resolve';
import type { ResolvedSection, SectionSpec } from '../section/types';
import { addError, isRecord } from './read-value';

const SHAPES = ['I', 'welded-I', 'RHS', 'CHS', 'flat'];

/** Sections and grades, one per span. */
export interface SpanMaterials {
	sections: ResolvedSection[];
	grades: (SteelGrade | null)[];
}

/** Prefixes library issue paths (`tf`, `loss`, '') with the case path. */
function relocate(list: InputIssue[], base: string): InputIssue[] {
	return list.map((issue) => ({
		...issue,
		path: issue.path === 'loss' ? 'beam.sectionLoss' : issue.path ? `${base}.${issue.path}` : base
	}));
}

/** Checks the outer form of a section entry before the library reads it. */
function checkSpecForm(raw: unknown, path: string, issues: InputIssue[]): raw is SectionSpec {
	if (!isRecord(raw)) {
		const message = 'Give the section: {"designation": …}, a shape with dimensions, or {"mp": …}.';
		addError(issues, path, 'section-missing', message);
		return false;
	}
	if ('designation' in raw) {
		if (typeof raw.designation === 'string') return true;
		const message = 'The designation must be text, e.g. "UB 305x165x40".';
		addError(issues, `${path}.designation`, 'not-a-string', message);
		return false;
	}
	if ('mp' in raw) return true;
	if (typeof raw.shape === 'string' && SHAPES.includes(raw.shape)) return true;
	const message = `The shape must be one of: ${SHAPES.join(', ')}.`;
	addError(issues, `${path}.shape`, 'not-one-of', message);
	return false;
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
	if (perSpan && spanCount !== undefined && raw.length !== spanCount) {
		const message = `Give one section for the beam or one per span (${spanCount}).`;
		addError(issues, 'beam.section', 'wrong-length', message);
		return undefined;
	}
	const entries: unknown[] = perSpan ? raw : [raw];
	const resolved: ResolvedSection[] = [];
	entries.forEach((spec, i) => {
		const path = perSpan ? `beam.section[${i}]` : 'beam.section';
		if (!checkSpecForm(spec, path, issues)) return;
		const r = resolveSection(spec, { loss });
		if (!r.ok) return void issues.push(...relocate(r.issues, path));
		warnings.push(...relocate(r.warnings, path));
		resolved.push(r.value);
	});
	if (resolved.length !== entries.length || spanCount === undefined) return undefined;
	const sections = perSpan ? resolved : new Array<ResolvedSection>(spanCount).fill(resolved[0]);
	const grades = resolveGrades(beam.grade, sections, issues, warnings);
	return grades ? { sections, grades } : undefined;
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
	const out: (SteelGrade | null)[] = [];
	for (const section of sections) {
		const gradeSpec = spec as string | { fy: number; fu?: number };
		const r = resolveGrade(gradeSpec, section.governingThickness);
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
