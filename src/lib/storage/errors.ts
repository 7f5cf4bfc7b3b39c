import type { StoreFailureReason, StoreResult } from './types';

/** Plain-language messages for each failure, shown as they are. */
export const FAILURE_MESSAGES: Readonly<Record<StoreFailureReason, string>> = {
	invalid: 'This is not something Hingepoint can keep, so nothing was changed.',
	quota:
		'The phone’s storage is full, so this was not saved. Everything saved before is still there; free some space and try again.',
	'read-only':
		'These checks were saved by a newer version of Hingepoint, so this copy can only read them. Update the app to make changes.',
	closed:
		'Hingepoint is updating and closed its saved checks. Reload the app to carry on; nothing saved was lost.',
	'not-found': 'That check is not on this device any more.',
	newer: 'This check was saved by a newer version of Hingepoint. Update the app to change it.',
	storage:
		'The phone would not let Hingepoint use its storage (private browsing or storage cleared?). Nothing was changed.'
};

/**
 * A failed outcome with the standard message for its reason.
 * @example
 * fail('not-found') // { ok: false, reason: 'not-found', message: 'That check is not …' }
 */
export function fail<T>(reason: StoreFailureReason, message?: string): StoreResult<T> {
	return { ok: false, reason, message: message ?? FAILURE_MESSAGES[reason] };
}

/**
 * Maps an IndexedDB error to a failure outcome: a full disk to 'quota', a closed or evicted
 * connection to 'closed', data that cannot be cloned and anything else to 'storage'.
 */
export function toFailure<T>(error: unknown): StoreResult<T> {
	const name = readErrorName(error);
	if (name === 'QuotaExceededError') return fail('quota');
	if (name === 'InvalidStateError' || name === 'TransactionInactiveError') return fail('closed');
	if (name === 'DataCloneError') {
		return fail(
			'storage',
			'This check holds data that cannot be stored, so nothing was changed. Please report it.'
		);
	}
	return fail('storage');
}

function readErrorName(error: unknown): string {
	if (typeof error === 'object' && error !== null && 'name' in error) return String(error.name);
	return '';
}
