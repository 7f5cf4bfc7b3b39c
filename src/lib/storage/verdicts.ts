import { RECORD_SCHEMA_VERSION } from './constants';
import type { CheckStore } from './db';
import { writeTo } from './tx';
import type { CheckRecord, ComputedVerdict, StoreResult, VerdictStamp } from './types';

/**
 * Works out the app's own verdict for a case. Injected by the UI layer, which owns the engine, so
 * storage never runs it. Must not throw; a case that fails validation is 'needs-attention'.
 */
export type Recompute = (input: unknown) => ComputedVerdict | Promise<ComputedVerdict>;

/** A verdict computed for a record as it was at `updatedAt`. */
export interface VerdictUpdate {
	id: string;
	updatedAt: string;
	computed: VerdictStamp;
}

/**
 * Whether a record's listed verdict must be (re)computed: none yet, or from another engine.
 * @example
 * needsVerdict({ computed: { verdict: 'pass', computedBy: '0.1.0' } }, '0.2.0') // true
 */
export function needsVerdict(
	record: Pick<CheckRecord, 'computed'>,
	engineVersion: string
): boolean {
	return record.computed?.computedBy !== engineVersion;
}

/**
 * Stores computed verdicts. Only the `computed` slot changes (no revision, same `updatedAt`); a
 * record edited since (another `updatedAt`), deleted or from a newer app is left alone.
 * Resolves to how many were written.
 */
export async function storeVerdicts(
	store: CheckStore,
	updates: readonly VerdictUpdate[]
): Promise<StoreResult<number>> {
	return writeTo(store, ['checks'], async (tx) => {
		const checks = tx.objectStore('checks');
		let written = 0;
		for (const update of updates) {
			const record = await checks.get(update.id);
			if (!record || record.updatedAt !== update.updatedAt || record.deletedAt !== null) continue;
			if (record.schemaVersion > RECORD_SCHEMA_VERSION) continue;
			await checks.put({ ...record, computed: update.computed });
			written += 1;
		}
		return { ok: true, value: written };
	});
}
