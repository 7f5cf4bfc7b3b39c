/**
 * A field path in the words the screen uses: labels as shown and 1-based numbers ("Load 2 —
 * position"), never the internal path (`loads[1].x`). Used by every message that names a field.
 */
import { splitPath } from './field-path';

const SECTION: Record<string, string> = {
	designation: 'designation',
	h: 'depth h',
	b: 'flange width b',
	tw: 'web thickness tw',
	tf: 'flange thickness tf',
	r: 'root radius r',
	mp: 'plastic moment Mp',
	mass: 'mass per metre',
	d: 'diameter',
	t: 'wall thickness'
};

const LOAD: Record<string, string> = {
	x: 'position from left end',
	value: 'size',
	from: 'from',
	to: 'to',
	start: 'load at start',
	end: 'load at end',
	action: 'what it is (existing or proposed)',
	kind: 'kind',
	label: 'name'
};

const FACTORS: Record<string, string> = {
	permanent: 'γG existing permanent',
	permanentAlone: 'D alone (dead-load-only combination)',
	imposed: 'γQ existing imposed',
	temporary: 'γ proposed temporary',
	gammaM0: 'γM0 section',
	gammaM1: 'γM1 member buckling',
	psi0: 'ψ0 existing imposed',
	psi0Temporary: 'ψ0 proposed temporary',
	xi: 'ξ',
	set: 'factor set'
};

const OTHER: Record<string, string> = {
	basis: 'Design basis',
	units: 'Units of the case file',
	'beam.grade': 'Steel grade',
	'beam.grade.fy': 'Steel grade — yield strength fy',
	'beam.sectionLoss': 'Section — loss per face',
	'beam.bearingLoads': 'Stiff bearing length under point loads',
	'beam.restraint': 'Lateral restraint',
	'beam.restraint.loadHeight': 'Lateral restraint — load height',
	'beam.supports': 'Supports',
	'beam.spans': 'Spans',
	'beam.joints': 'Joints',
	'beam.section': 'Section',
	deflectionLimit: 'Deflection limit',
	loads: 'Loads',
	title: 'Title'
};

/** Support letters as the drawings show them: A at the left end. */
const letter = (i: number) => String.fromCharCode(65 + i);

/**
 * The screen's name for a field path.
 * @example
 * describeFieldPath('loads[1].x') // 'Load 2 — position from left end'
 */
export function describeFieldPath(path: string): string {
	if (OTHER[path]) return OTHER[path];
	const p = splitPath(path);
	const [a, b, c, d] = p;
	if (a === 'loads' && typeof b === 'number') {
		return c === undefined ? `Load ${b + 1}` : `Load ${b + 1} — ${LOAD[String(c)] ?? String(c)}`;
	}
	if (a === 'factors' && typeof b === 'string') return `Factors — ${FACTORS[b] ?? b}`;
	if (a === 'beam') {
		if (b === 'spans' && typeof c === 'number') return `Span ${c + 1} — length`;
		if (b === 'supports' && typeof c === 'number') return `Support ${letter(c)}`;
		if (b === 'joints' && typeof c === 'number') return `Joint at support ${letter(c + 1)}`;
		if (b === 'bearing' && typeof c === 'number') return `Stiff bearing at support ${letter(c)}`;
		if (b === 'section') {
			if (typeof c === 'number')
				return `Section of span ${c + 1}${d === undefined ? '' : ` — ${SECTION[String(d)] ?? d}`}`;
			return c === undefined ? 'Section' : `Section — ${SECTION[String(c)] ?? c}`;
		}
		if (b === 'restraint' && c === 'lateral') {
			return typeof d === 'number' ? `Restraint position ${d + 1}` : 'Lateral restraint';
		}
	}
	// A field the screen does not show by itself: say so in plain words, still without the path.
	return 'The check as entered';
}
