import type { DBSchema } from 'idb';
import type { CaseFile } from './case-file';
import type { CheckRecord, PhotoRecord, Place, Revision } from './types';

/** A check record as version 1 wrote it: the place was one free-text string. */
export interface CheckRecordV1 {
	id: string;
	schemaVersion: 1;
	title: string;
	place: string;
	notes: string;
	createdAt: string;
	updatedAt: string;
	engineVersion: string;
	input: CaseFile;
	result: unknown;
	revisions: Revision[];
	deletedAt: string | null;
}

/** A check record as version 2 wrote it: no computed verdict, lists read the stored result. */
export interface CheckRecordV2 {
	id: string;
	schemaVersion: 2;
	title: string;
	place: Place;
	notes: string;
	createdAt: string;
	updatedAt: string;
	engineVersion: string;
	input: CaseFile;
	result: unknown;
	revisions: Revision[];
	deletedAt: string | null;
}

/** The one current draft of the check form; `form` is what the form holds, possibly half-filled. */
export interface DraftRecord {
	slot: string;
	savedAt: string;
	/** The saved check this draft edits, or null for a new check. */
	recordId: string | null;
	form: unknown;
}

/** Small key–value entries: settings and one-time flags. */
export interface MetaRecord {
	key: string;
	value: unknown;
}

/** Database version 1. */
export interface HingepointDBv1 extends DBSchema {
	checks: { key: string; value: CheckRecordV1 };
	drafts: { key: string; value: DraftRecord };
	meta: { key: string; value: MetaRecord };
}

/** Database version 2: place split out, newest-first index on `updatedAt`. */
export interface HingepointDBv2 extends DBSchema {
	checks: { key: string; value: CheckRecordV2; indexes: { 'by-updated': string } };
	drafts: { key: string; value: DraftRecord };
	meta: { key: string; value: MetaRecord };
}

/** Database version 3: same stores; records carry the verdict the app computed. */
export interface HingepointDBv3 extends DBSchema {
	checks: { key: string; value: CheckRecord; indexes: { 'by-updated': string } };
	drafts: { key: string; value: DraftRecord };
	meta: { key: string; value: MetaRecord };
}

/** Database version 4 (current): photos of checks in their own store, keyed `[checkId, id]`. */
export interface HingepointDB extends DBSchema {
	checks: { key: string; value: CheckRecord; indexes: { 'by-updated': string } };
	drafts: { key: string; value: DraftRecord };
	meta: { key: string; value: MetaRecord };
	photos: { key: [string, string]; value: PhotoRecord };
}
