import type { Checked } from '../model/issue';
import type { ResolvedSection, SectionDims, SectionShape, SectionSpec } from './types';
import { computeSectionProperties } from './properties';
import { validateSectionDims } from './validate-dims';
import { applySectionLoss } from './loss';
import { resolveKnownMp } from './known-mp';
import { readSectionSpec } from './read-spec';
import { withDesignWall } from './hss-wall';

/** Options for resolveSection. */
export interface ResolveSectionOptions {
	/** Uniform thickness loss per exposed face, mm (default 0). */
	loss?: number;
	/**
	 * Material id of the steel: a US HSS or pipe takes its design wall from it (AISC 360-22 B4.2:
	 * nominal for A1085, 0.93 × nominal otherwise, the table's wall when not given).
	 */
	gradeId?: string;
}

type Dimensioned = Exclude<SectionShape, 'known-mp'>;

/** Thickness that sets the grade's strength step: flange for rolled I, thickest plate otherwise. */
function findGoverningThickness(shape: Dimensioned, dims: SectionDims): number {
	const d = dims as unknown as Record<string, number>;
	if (shape === 'I') return d.tf;
	if (shape === 'welded-I') return Math.max(d.tf, d.tw);
	if (shape === 'flat') return Math.min(d.h, d.b);
	return d.t;
}

/**
 * Resolves a case-file section into dimensions and properties, after an optional uniform loss
 * per exposed face (see applySectionLoss). Issue paths are relative to the spec (`tf`,
 * `designation`) or `loss`; the caller prefixes them.
 * @example
 * const r = resolveSection({ designation: 'UB 305x165x40' }, { loss: 0.5 });
 * // r.ok && r.value.dims.tf === 9.2 && r.value.loss === 0.5
 */
export function resolveSection(
	spec: SectionSpec,
	options: ResolveSectionOptions = {}
): Checked<ResolvedSection> {
	const loss = options.loss ?? 0;
	if (!Number.isFinite(loss) || loss < 0) {
		const message = 'The section loss must be zero or a positive number of mm per face.';
		const issue = { path: 'loss', code: 'loss-not-valid', message, severity: 'error' } as const;
		return { ok: false, issues: [issue] };
	}
	if ('mp' in spec) return resolveKnownMp(spec, loss);
	const read = readSectionSpec(spec);
	if (!read.ok) return read;
	const { shape, designation, family, standard, defaultGrade, nominalWall } = read.value;
	const table = read.value.dims;
	const given =
		nominalWall !== undefined && options.gradeId !== undefined
			? withDesignWall(shape, table, nominalWall, options.gradeId)
			: table;
	const dimIssues = validateSectionDims(shape, given);
	if (dimIssues.length > 0) return { ok: false, issues: dimIssues };
	const reduced = applySectionLoss(shape, given, loss);
	if (!reduced.ok) return reduced;
	// A loss can leave plates but break the fit (e.g. no straight web left): report it as the loss.
	const afterIssues = validateSectionDims(shape, reduced.dims);
	if (afterIssues.length > 0) {
		const issues = afterIssues.map((i) => ({ ...i, path: 'loss', code: 'loss-consumes-element' }));
		return { ok: false, issues };
	}
	const dims = reduced.dims;
	const value: ResolvedSection = {
		designation,
		family,
		standard,
		shape,
		dims,
		props: computeSectionProperties(shape, dims),
		loss,
		governingThickness: findGoverningThickness(shape, dims)
	};
	// Library identity only: measured sections have no family grade or table wall.
	if (defaultGrade !== undefined) value.defaultGrade = defaultGrade;
	if (nominalWall !== undefined) {
		value.nominalWall = nominalWall;
		value.designWall = (given as { t: number }).t;
	}
	return { ok: true, value, warnings: read.warnings };
}
