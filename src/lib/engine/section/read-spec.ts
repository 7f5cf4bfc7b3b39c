import type { Checked } from '../model/issue';
import type { SectionDims, SectionFamily, SectionShape, SectionSpec } from './types';
import { findSection, suggestSections } from './search';
import { computeRhsCornerRadii } from './rhs';

type Dimensioned = Exclude<SectionShape, 'known-mp'>;

/** A dimensioned spec read into shape and dims, with its catalogue identity when it has one. */
export interface ReadSpec {
	shape: Dimensioned;
	dims: SectionDims;
	designation: string;
	family?: SectionFamily;
	standard?: string;
	/** The library family's usual grade, a material id. */
	defaultGrade?: string;
	/** Nominal wall of a US HSS or pipe, mm. */
	nominalWall?: number;
}

/** A short description of a measured section, e.g. `I 300x150x7.1x10.7 (measured)`. */
function describeMeasured(shape: Dimensioned, dims: SectionDims): string {
	const values = Object.entries(dims)
		.filter(([key]) => !['r', 'ro', 'ri'].includes(key))
		.map(([, value]) => String(Math.round(value * 100) / 100));
	return `${shape} ${values.join('x')} (measured)`;
}

/** A refusal with one error issue. */
function refuse(path: string, code: string, message: string): Checked<ReadSpec> {
	return { ok: false, issues: [{ path, code, message, severity: 'error' }] };
}

/** Said when a measured rolled I comes without its root radius. */
const ROOT_RADIUS_ASSUMED = {
	path: 'r',
	code: 'root-radius-assumed',
	message: 'No root radius given: taken as r = 0, which gives the smallest section properties.',
	severity: 'warning'
} as const;

/** Wraps a measured section. */
function makeMeasured(shape: Dimensioned, dims: SectionDims): Checked<ReadSpec> {
	const designation = describeMeasured(shape, dims);
	return { ok: true, value: { shape, dims, designation }, warnings: [] };
}

/** Looks a designation up in the library, naming the nearest ones when it is unknown. */
function readDesignation(text: string): Checked<ReadSpec> {
	const found = findSection(text);
	if (!found) {
		const near = suggestSections(text, 3).join(', ');
		const message = `No section called "${text}" in the library. Nearest: ${near}.`;
		return refuse('designation', 'section-unknown', message);
	}
	const { designation, family, standard, dims, defaultGrade, nominalWall } = found;
	const shape = found.shape as Dimensioned;
	const value: ReadSpec = { shape, dims: { ...dims }, designation, family, standard, defaultGrade };
	if (nominalWall !== undefined) value.nominalWall = nominalWall;
	return { ok: true, value, warnings: [] };
}

/**
 * Turns a dimensioned section spec (designation or measured shape, mm) into shape and dims.
 * Dimensions are not validated here (see validateSectionDims).
 * @example readSectionSpec({ shape: 'CHS', d: 114.3, t: 5 }) // ok, 'CHS 114.3x5 (measured)'
 */
export function readSectionSpec(spec: Exclude<SectionSpec, { mp: number }>): Checked<ReadSpec> {
	if ('designation' in spec) {
		return readDesignation(typeof spec.designation === 'string' ? spec.designation : '');
	}
	switch (spec.shape) {
		case 'I': {
			const measured = makeMeasured('I', {
				h: spec.h,
				b: spec.b,
				tw: spec.tw,
				tf: spec.tf,
				r: spec.r ?? 0
			});
			// No root radius measured: r = 0 is the cautious reading (smallest area, I and W).
			if (spec.r === undefined && measured.ok) measured.warnings.push(ROOT_RADIUS_ASSUMED);
			return measured;
		}
		case 'welded-I':
			return makeMeasured('welded-I', { h: spec.h, b: spec.b, tw: spec.tw, tf: spec.tf, r: 0 });
		case 'RHS': {
			const process = spec.process ?? 'hot';
			if (process !== 'hot' && process !== 'cold') {
				const message = 'process must be "hot" (EN 10210) or "cold" (EN 10219).';
				return refuse('process', 'process-unknown', message);
			}
			const radii = computeRhsCornerRadii(spec.t, process);
			return makeMeasured('RHS', { h: spec.h, b: spec.b, t: spec.t, ...radii });
		}
		case 'CHS':
			return makeMeasured('CHS', { d: spec.d, t: spec.t });
		case 'flat':
			return makeMeasured('flat', { h: spec.h, b: spec.b });
		default: {
			// Case files arrive as JSON, so a shape outside the union is possible at run time.
			const shape = String((spec as { shape?: unknown }).shape);
			const message = `Unknown shape "${shape}": use I, welded-I, RHS, CHS, flat, a designation or mp.`;
			return refuse('shape', 'shape-unknown', message);
		}
	}
}
