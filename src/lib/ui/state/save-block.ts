import type { CheckOutcome } from './check-outcome';
import { describeFieldPath } from './field-words';

/** Why a check cannot be saved as finished yet, and the field to go to (null: none in particular). */
export interface SaveBlock {
	reason: string;
	path: string | null;
}

/**
 * What stops the check from being saved: the first field to fix, else an answer not worked out.
 * Only a check with a result is saved; anything else stays a draft.
 * @example
 * findSaveBlock([{ path: 'loads[1].x', message: 'Not entered yet.' }], null)?.reason
 * // 'Fix Load 2 — position from left end first'
 */
export function findSaveBlock(
	problems: readonly { path: string; message: string }[],
	outcome: CheckOutcome | null
): SaveBlock | null {
	if (problems.length > 0) {
		return { reason: `Fix ${describeFieldPath(problems[0].path)} first`, path: problems[0].path };
	}
	if (outcome?.state === 'error') return { reason: 'No result could be worked out', path: null };
	if (outcome?.state !== 'report')
		return { reason: 'The result is still being worked out', path: null };
	return null;
}
