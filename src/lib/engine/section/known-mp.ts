import type { Checked, InputIssue } from '../model/issue';
import type { ResolvedSection } from './types';
import { kNmToNmm } from '../units';

/** Builds one error issue. */
function makeError(path: string, code: string, message: string): InputIssue {
	return { path, code, message, severity: 'error' };
}

/**
 * Resolves a section known only by its plastic moment (kN·m) and optional mass (kg/m).
 * A section loss cannot be applied to a bare Mp, so a non-zero loss is refused, not ignored.
 * @example resolveKnownMp({ mp: 171.3 }, 0) // ok, mpKnown = 171.3e6 N·mm
 */
export function resolveKnownMp(
	spec: { mp: number; mass?: number },
	loss: number
): Checked<ResolvedSection> {
	const issues: InputIssue[] = [];
	if (typeof spec.mp !== 'number' || !Number.isFinite(spec.mp) || spec.mp <= 0) {
		issues.push(makeError('mp', 'mp-not-positive', 'Mp must be a positive number of kN·m.'));
	}
	if (spec.mass !== undefined && (!Number.isFinite(spec.mass) || spec.mass < 0)) {
		const message = 'The mass must be zero or a positive number of kg/m.';
		issues.push(makeError('mass', 'mass-not-valid', message));
	}
	if (loss > 0) {
		const message =
			'A section loss cannot be applied to a known Mp: ' +
			'reduce Mp for the loss and enter a loss of 0.';
		issues.push(makeError('loss', 'loss-on-known-mp', message));
	}
	if (issues.length > 0) return { ok: false, issues };
	const value: ResolvedSection = {
		designation: `Mp ${spec.mp} kNm (given)`,
		shape: 'known-mp',
		dims: null,
		props: null,
		mpKnown: kNmToNmm(spec.mp),
		massKnown: spec.mass,
		loss: 0,
		governingThickness: 0
	};
	const message =
		'Mp was given directly: the cross-section class cannot be checked; ' +
		'confirm it is Class 1 (plastic).';
	return {
		ok: true,
		value,
		warnings: [{ path: 'mp', code: 'class-unknown', message, severity: 'warning' }]
	};
}
