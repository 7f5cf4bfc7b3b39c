import { BLANK, isBlank } from '$lib/ui/state/blank-value';
import type { CaseAction, CaseLoad } from '$lib/ui/state/case-file';

/** How a load is offered on the form; `whole` and `part` are both uniform loads in the case. */
export type LoadChoice = 'point' | 'whole' | 'part' | 'linear';

export const LOAD_CHOICES: readonly { id: LoadChoice; label: string }[] = [
	{ id: 'point', label: 'Point load' },
	{ id: 'whole', label: 'Uniform, whole beam' },
	{ id: 'part', label: 'Uniform, part of the beam' },
	{ id: 'linear', label: 'Linearly varying' }
];

export const ACTION_CHOICES: readonly { id: CaseAction; label: string }[] = [
	{ id: 'temporary', label: 'Proposed temporary' },
	{ id: 'permanent', label: 'Existing permanent' },
	{ id: 'imposed', label: 'Existing imposed' }
];

/**
 * Which form choice a load is, given the beam length (m).
 * @example
 * readLoadChoice({ kind: 'uniform', from: 0, to: 6, value: 2, action: 'permanent' }, 6) // 'whole'
 */
export function readLoadChoice(load: CaseLoad, length: number): LoadChoice {
	if (load.kind === 'point') return 'point';
	if (load.kind === 'linear') return 'linear';
	// Ends not entered yet: the form shows them to be filled in.
	if (isBlank(load.from) || isBlank(load.to)) return 'part';
	return Math.abs(load.from) < 1e-9 && Math.abs(load.to - length) < 1e-9 ? 'whole' : 'part';
}

/**
 * A load of another kind keeping the action and, where it makes sense, the size (SI).
 * @example
 * convertLoad({ kind: 'point', x: 2, value: 10, action: 'temporary' }, 'whole', 6).to // 6
 */
export function convertLoad(load: CaseLoad, choice: LoadChoice, length: number): CaseLoad {
	// A size not entered yet stays empty (Math.max would read it as 0).
	const size =
		load.kind !== 'linear'
			? load.value
			: isBlank(load.end)
				? load.start
				: isBlank(load.start)
					? load.end
					: Math.max(load.start, load.end);
	const { action } = load;
	if (choice === 'point') return { kind: 'point', x: round(length / 2), value: size, action };
	if (choice === 'whole') return { kind: 'uniform', from: 0, to: length, value: size, action };
	if (choice === 'part')
		return {
			kind: 'uniform',
			from: round(length / 4),
			to: round((3 * length) / 4),
			value: size,
			action
		};
	return { kind: 'linear', from: 0, to: length, start: 0, end: size, action };
}

/**
 * A new load of a kind: size, position and action left for the user (a made-up number could be
 * taken for a measured one); a uniform or varying load spans the whole beam.
 */
export function createLoad(choice: LoadChoice, length: number): CaseLoad {
	const action = BLANK as unknown as CaseAction;
	if (choice === 'point') return { kind: 'point', x: BLANK, value: BLANK, action };
	if (choice === 'whole') return { kind: 'uniform', from: 0, to: length, value: BLANK, action };
	if (choice === 'part') return { kind: 'uniform', from: BLANK, to: BLANK, value: BLANK, action };
	return { kind: 'linear', from: 0, to: length, start: BLANK, end: BLANK, action };
}

function round(v: number): number {
	return Math.round(v * 1000) / 1000;
}
