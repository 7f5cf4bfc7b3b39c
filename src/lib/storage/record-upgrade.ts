import { isPlainObject } from './case-file';
import { RECORD_SCHEMA_VERSION } from './constants';
import type { CheckRecordV1, CheckRecordV2 } from './schema';
import type { CheckRecord } from './types';

/** One pure record-shape upgrade, from `from` to `from + 1`. */
export interface RecordUpgrader {
	from: number;
	/** Why the shape changed. */
	reason: string;
	up: (record: Record<string, unknown>) => Record<string, unknown>;
}

/**
 * Record-shape upgrades in order; `from` rises by exactly one and is never reused.
 */
export const RECORD_UPGRADERS: readonly RecordUpgrader[] = [
	{
		from: 1,
		reason: 'place split into building, level and grid so each can be filled and searched',
		up: (record) =>
			upgradeRecordV1(record as unknown as CheckRecordV1) as unknown as Record<string, unknown>
	},
	{
		from: 2,
		reason: 'lists show only a verdict this app computed, never a stored result it did not check',
		up: (record) =>
			upgradeRecordV2(record as unknown as CheckRecordV2) as unknown as Record<string, unknown>
	}
];

/** Outcome of bringing a stored record up to the current shape. */
export type RecordUpgrade =
	| { ok: true; record: CheckRecord; upgraded: boolean }
	| { ok: false; reason: 'newer' | 'damaged'; message: string };

/**
 * Brings a record of any older schema version up to the current one; a record from a newer
 * version is refused (never rewritten). Does not mutate its argument.
 * @example
 * upgradeRecord({ schemaVersion: 1, place: 'Block A', … }).record.place
 * // { building: 'Block A', level: '', grid: '' }
 */
export function upgradeRecord(raw: unknown): RecordUpgrade {
	const stated = isPlainObject(raw) ? raw.schemaVersion : undefined;
	if (!isPlainObject(raw) || !Number.isInteger(stated) || (stated as number) < 1) {
		return { ok: false, reason: 'damaged', message: 'A saved check has no valid schema version.' };
	}
	let version = stated as number;
	if (version > RECORD_SCHEMA_VERSION) {
		return {
			ok: false,
			reason: 'newer',
			message: 'This check was saved by a newer version of Hingepoint. Update the app to open it.'
		};
	}
	let record: Record<string, unknown> = raw;
	for (const step of RECORD_UPGRADERS) {
		if (step.from !== version) continue;
		record = { ...step.up(record), schemaVersion: version + 1 };
		version += 1;
	}
	if (version !== RECORD_SCHEMA_VERSION) {
		throw new Error(`invariant: no upgrader from schema ${version}`);
	}
	return { ok: true, record: record as unknown as CheckRecord, upgraded: record !== raw };
}

/**
 * v1 → v2: the free-text place moves whole into `building` (nothing is guessed or lost).
 */
export function upgradeRecordV1(record: CheckRecordV1): CheckRecordV2 {
	const { place, ...rest } = record;
	return { ...rest, schemaVersion: 2, place: { building: place, level: '', grid: '' } };
}

/**
 * v2 → v3: an empty computed-verdict slot; the list recomputes it with the current engine. The
 * stored result stays as it was (nothing is lost), it is just no longer what the list shows.
 */
export function upgradeRecordV2(record: CheckRecordV2): CheckRecord {
	return { ...record, schemaVersion: 3, computed: null };
}
