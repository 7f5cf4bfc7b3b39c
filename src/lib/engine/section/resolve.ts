import type { Checked, InputIssue } from '../model/issue';
import type {
	IDims,
	ResolvedSection,
	SectionDims,
	SectionFamily,
	SectionShape,
	SectionSpec
} from './types';
import { findSection, suggestSections } from './search';
import { computeSectionProperties } from './properties';
import { validateSectionDims } from './validate-dims';
import { applySectionLoss } from './loss';
import { computeRhsCornerRadii } from './rhs';
import { resolveKnownMp } from './known-mp';

/** Options for resolveSection. */
export interface ResolveSectionOptions {
	/** Uniform thickness loss per exposed face, mm (default 0). */
	loss?: number;
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

/** A short description of a measured section, e.g. `I 300x150x7.1x10.7 (measured)`. */
function describeMeasured(shape: Dimensioned, dims: SectionDims): string {
	const values = Object.entries(dims)
		.filter(([key]) => !['r', 'ro', 'ri'].includes(key))
		.map(([, value]) => String(Math.round(value * 100) / 100));
	return `${shape} ${values.join('x')} (measured)`;
}

/** Turns a spec into shape, dims and (for library sections) its catalogue identity. */
function readSpec(spec: SectionSpec): Checked<{
	shape: Dimensioned;
	dims: SectionDims;
	designation?: string;
	family?: SectionFamily;
	standard?: string;
}> {
	if ('designation' in spec) {
		const text = typeof spec.designation === 'string' ? spec.designation : '';
		const found = findSection(text);
		if (found) {
			const { designation, family, standard, dims } = found;
			return { ok: true, value: { shape: found.shape as Dimensioned, dims, designation, family, standard }, warnings: [] };
		}
		const near = suggestSections(text, 3).join(', ');
		const message = `No section called "${text}" in the library. Nearest: ${near}.`;
		return { ok: false, issues: [{ path: 'designation', code: 'section-unknown', message, severity: 'error' }] };
	}
	if (!('shape' in spec)) throw new Error('invariant: known-mp spec reached readSpec');
	switch (spec.shape) {
		case 'I':
			return { ok: true, value: { shape: 'I', dims: { h: spec.h, b: spec.b, tw: spec.tw, tf: spec.tf, r: spec.r } }, warnings: [] };
		case 'welded-I':
			return { ok: true, value: { shape: 'welded-I', dims: { h: spec.h, b: spec.b, tw: spec.tw, tf: spec.tf, r: 0 } }, warnings: [] };
		case 'RHS': {
			const radii = computeRhsCornerRadii(spec.t, spec.process ?? 'hot');
			return { ok: true, value: { shape: 'RHS', dims: { h: spec.h, b: spec.b, t: spec.t, ...radii } }, warnings: [] };
		}
		case 'CHS':
			return { ok: true, value: { shape: 'CHS', dims: { d: spec.d, t: spec.t } }, warnings: [] };
		case 'flat':
			return { ok: true, value: { shape: 'flat', dims: { h: spec.h, b: spec.b } }, warnings: [] };
	}
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
		return { ok: false, issues: [{ path: 'loss', code: 'loss-not-valid', message, severity: 'error' }] };
	}
	if ('mp' in spec) return resolveKnownMp(spec, loss);
	const read = readSpec(spec);
	if (!read.ok) return read;
	const { shape, designation, family, standard } = read.value;
	const dimIssues: InputIssue[] = validateSectionDims(shape, read.value.dims);
	if (dimIssues.length > 0) return { ok: false, issues: dimIssues };
	const reduced = applySectionLoss(shape, read.value.dims, loss);
	if (!reduced.ok) return reduced;
	const afterIssues = validateSectionDims(shape, reduced.dims);
	if (afterIssues.length > 0) {
		return { ok: false, issues: afterIssues.map((issue) => ({ ...issue, path: 'loss', code: 'loss-consumes-element' })) };
	}
	const dims = reduced.dims;
	return {
		ok: true,
		value: {
			designation: designation ?? describeMeasured(shape, read.value.dims as IDims),
			family,
			standard,
			shape,
			dims,
			props: computeSectionProperties(shape, dims),
			loss,
			governingThickness: findGoverningThickness(shape, dims)
		},
		warnings: []
	};
}
