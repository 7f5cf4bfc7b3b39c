/**
 * Structural validation of a beam line: lengths of the lists, positive spans, `free` only at the
 * ends, and beams that would move with no load at all (a mechanism before anything is applied).
 */
import { solveEquilibrium } from '../collapse/nullspace';
import { buildFieldModel } from '../collapse/statics';
import { findMechanismIssues } from '../elastic/mechanism';
import type { InputIssue } from './issue';
import type { BeamLine } from './types';

const SUPPORTS = ['pin', 'fixed', 'free'];
const JOINTS = ['continuous', 'simple'];

function error(path: string, code: string, message: string): InputIssue {
	return { path, code, message, severity: 'error' };
}

/**
 * Problems with the geometry and supports of a beam line; an empty list means the beam is stable.
 * @example validateBeamLine({ spans: [6000], supports: ['pin', 'free'], joints: [] })
 * // → [{ code: 'beam-is-mechanism', path: 'beam.supports', … }]
 */
export function validateBeamLine(beam: BeamLine): InputIssue[] {
	const issues: InputIssue[] = [];
	const n = Array.isArray(beam.spans) ? beam.spans.length : 0;
	if (n === 0) return [error('beam.spans', 'no-spans', 'The beam needs at least one span.')];
	beam.spans.forEach((s, i) => {
		if (!Number.isFinite(s) || s <= 0) {
			issues.push(
				error(`beam.spans[${i}]`, 'span-not-positive', `Span ${i + 1} must be longer than zero.`)
			);
		}
	});
	if (!Array.isArray(beam.supports) || beam.supports.length !== n + 1) {
		issues.push(
			error(
				'beam.supports',
				'supports-count',
				`Give ${n + 1} supports, one per node, for ${n} span(s).`
			)
		);
	}
	if (!Array.isArray(beam.joints) || beam.joints.length !== n - 1) {
		issues.push(
			error('beam.joints', 'joints-count', `Give ${n - 1} joint(s), one per internal node.`)
		);
	}
	if (issues.length > 0) return issues;
	beam.supports.forEach((s, i) => {
		if (!SUPPORTS.includes(s))
			issues.push(
				error(
					`beam.supports[${i}]`,
					'support-unknown',
					`Support ${i + 1} must be pin, fixed or free.`
				)
			);
		else if (s === 'free' && i > 0 && i < n) {
			issues.push(
				error(
					`beam.supports[${i}]`,
					'free-inside',
					'Only the two ends of the beam can be free (a cantilever or overhang).'
				)
			);
		}
	});
	beam.joints.forEach((j, k) => {
		if (!JOINTS.includes(j))
			issues.push(
				error(`beam.joints[${k}]`, 'joint-unknown', `Joint ${k + 1} must be continuous or simple.`)
			);
		else if (j === 'simple' && beam.supports[k + 1] === 'fixed') {
			issues.push({
				path: `beam.supports[${k + 1}]`,
				code: 'fixity-ignored-at-simple-joint',
				message: 'A simple joint passes no moment, so this support is treated as a pin.',
				severity: 'warning'
			});
		}
	});
	if (issues.some((i) => i.severity === 'error')) return issues;
	// Both solvers must agree the beam can carry load: the collapse statics, where a fixed support
	// at a simple joint acts as a pin, and the elastic stiffness (its own rank test).
	if (isMechanismWithoutLoad(beam) || findMechanismIssues(beam).length > 0) {
		issues.push(
			error(
				'beam.supports',
				'beam-is-mechanism',
				'The beam can move without bending: add a support, fix an end or make a joint continuous.'
			)
		);
	}
	return issues;
}

/** True when the equilibrium equations cannot be met for every load (the beam is a mechanism). */
function isMechanismWithoutLoad(beam: BeamLine): boolean {
	// Unit total length keeps the rank test independent of the length unit.
	const total = beam.spans.reduce((a, b) => a + b, 0);
	const unit = { ...beam, spans: beam.spans.map((s) => s / total) };
	const model = buildFieldModel({ beam: unit, fixedLoads: [], variableLoads: [] });
	const E = model.E.map((row) => row.slice(0, model.lambdaIndex));
	if (E[0].length === 0) return true;
	return solveEquilibrium(E, new Array<number>(E.length).fill(0)).rank < E.length;
}
