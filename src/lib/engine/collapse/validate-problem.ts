/**
 * Validation of a collapse problem beyond the beam line: the resistance must cover the whole beam
 * with positive values, and every load must be finite and lie on the beam.
 */
import type { InputIssue } from '../model/issue';
import { validateBeamLine } from '../model/validate-beam';
import type { Load } from '../model/types';
import type { CollapseProblem } from './types';

function error(path: string, code: string, message: string): InputIssue {
	return { path, code, message, severity: 'error' };
}

function checkLoad(load: Load, path: string, L: number): InputIssue[] {
	// Positions converted from other units may pass the ends by rounding; the solver clamps them.
	const slack = 1e-9 * L;
	const onBeam = (x: number) => Number.isFinite(x) && x >= -slack && x <= L + slack;
	if (load.kind === 'point') {
		if (!onBeam(load.x))
			return [error(`${path}.x`, 'load-off-beam', 'The load must sit on the beam.')];
		if (!Number.isFinite(load.value))
			return [error(`${path}.value`, 'load-not-finite', 'Give the load as a number.')];
		return [];
	}
	if (!onBeam(load.from) || !onBeam(load.to) || !(load.to > load.from)) {
		return [error(`${path}.from`, 'load-range', 'A line load needs from < to, both on the beam.')];
	}
	const values = load.kind === 'uniform' ? [load.value] : [load.start, load.end];
	if (!values.every(Number.isFinite))
		return [error(`${path}.value`, 'load-not-finite', 'Give the load as a number.')];
	return [];
}

/** Every problem with a collapse problem; solveCollapse requires none of severity 'error'. */
export function validateCollapseProblem(problem: CollapseProblem): InputIssue[] {
	const issues = validateBeamLine(problem.beam);
	if (issues.some((i) => i.severity === 'error')) return issues;
	const L = problem.beam.spans.reduce((a, b) => a + b, 0);
	const caps = [...problem.capacity].sort((a, b) => a.from - b.from);
	let reach = 0;
	caps.forEach((c, i) => {
		const path = `capacity[${problem.capacity.indexOf(c)}]`;
		if (!(
			c.sagging > 0 &&
			c.hogging > 0 &&
			Number.isFinite(c.sagging) &&
			Number.isFinite(c.hogging)
		)) {
			issues.push(
				error(path, 'capacity-not-positive', 'Moment resistances must be positive numbers.')
			);
		}
		if (!(c.to > c.from) || c.from > reach + 1e-9 * L) {
			issues.push(
				error(path, 'capacity-gap', 'Resistance segments must cover the beam without gaps.')
			);
		}
		reach = Math.max(reach, c.to);
		if (i === caps.length - 1 && reach < L * (1 - 1e-9)) {
			issues.push(
				error(path, 'capacity-gap', 'Resistance segments must reach the end of the beam.')
			);
		}
	});
	if (caps.length === 0)
		issues.push(error('capacity', 'capacity-missing', 'Give the moment resistance of the beam.'));
	problem.fixedLoads.forEach((l, i) => issues.push(...checkLoad(l, `fixedLoads[${i}]`, L)));
	problem.variableLoads.forEach((l, i) => issues.push(...checkLoad(l, `variableLoads[${i}]`, L)));
	return issues;
}
