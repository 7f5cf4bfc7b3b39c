import type { CaseFile } from './case-file';

/** Where the beam is: free text fields, any of which may be empty. */
export interface Place {
	building: string;
	level: string;
	/** Grid reference, e.g. 'C/4–5'. */
	grid: string;
}

/** An earlier state of a check, kept when its inputs or result were edited. */
export interface Revision {
	/** When this state was saved (ISO 8601, UTC). */
	savedAt: string;
	input: CaseFile;
	/** The report as computed then (structured-cloneable), or null if none was computed. */
	result: unknown;
	engineVersion: string;
}

/**
 * What this app's own engine made of a check's inputs: a verdict, 'no-load' (valid, but no proposed
 * load to judge), or 'needs-attention' (the inputs did not pass validation, or the engine failed).
 */
export type ComputedVerdict = 'pass' | 'fail' | 'outside-scope' | 'no-load' | 'needs-attention';

/** A verdict with the engine version that computed it, so a newer engine knows to recompute. */
export interface VerdictStamp {
	verdict: ComputedVerdict;
	computedBy: string;
}

/** A saved check (record schema version 3). Dates are ISO 8601 strings in UTC. */
export interface CheckRecord {
	id: string;
	schemaVersion: number;
	title: string;
	place: Place;
	notes: string;
	createdAt: string;
	updatedAt: string;
	/** Version of the engine that computed `result`. */
	engineVersion: string;
	/** The inputs, as a case file in SI (m, kN, kN/m, kNm). */
	input: CaseFile;
	/**
	 * The report as computed (structured-cloneable), or null. From a backup file it is the file's
	 * claim: kept, never shown; lists read `computed` instead.
	 */
	result: unknown;
	/** The verdict this app computed for `input`; null until computed (or after `input` changed). */
	computed: VerdictStamp | null;
	/** Earlier states, oldest first. */
	revisions: Revision[];
	/** Set when deleted (soft delete, so undo restores the record exactly); null otherwise. */
	deletedAt: string | null;
}

/** Image type of a stored photo. */
export type PhotoType = 'image/jpeg' | 'image/png' | 'image/webp';

/**
 * A photo of a check (photo schema version 1), stored apart from the check record so that
 * listing checks never loads image bytes. Keyed by `[checkId, id]`.
 */
export interface PhotoRecord {
	checkId: string;
	id: string;
	schemaVersion: number;
	type: PhotoType;
	/** The image file's bytes (an ArrayBuffer: some phone browsers stored Blobs unreliably). */
	data: ArrayBuffer;
	width: number;
	height: number;
	caption: string;
	/** When it was attached (ISO 8601, UTC); photos are listed in this order. */
	addedAt: string;
}

/** Why a storage call failed. */
export type StoreFailureReason =
	'invalid' | 'quota' | 'read-only' | 'closed' | 'not-found' | 'newer' | 'storage';

/** Outcome of a storage call: never an exception for an expected failure. */
export type StoreResult<T> =
	{ ok: true; value: T } | { ok: false; reason: StoreFailureReason; message: string };

/** Optional clock for calls that stamp a date (tests pass a fixed one). */
export interface ClockOptions {
	now?: Date;
}
