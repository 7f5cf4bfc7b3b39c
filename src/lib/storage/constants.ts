/** Default IndexedDB database name; tests pass their own so each gets a fresh database. */
export const DB_NAME = 'hingepoint';

/**
 * IndexedDB version this code creates and reads. Never reuse a number: v1 first stores; v2 split
 * the place into building, level and grid and added the newest-first index; v3 rewrote records
 * with an empty computed-verdict slot; v4 added the photos store.
 */
export const DB_VERSION = 4;

/** Shape version written into every check record (see migrations.ts for the upgraders). */
export const RECORD_SCHEMA_VERSION = 3;

/** Backup file format name and version (our own). */
export const BACKUP_FORMAT = 'hingepoint.backup';
/** Version 2 added photos; version 1 files (no photos) are still read. */
export const BACKUP_VERSION = 2;

/**
 * Largest backup read or written, in characters (100 MB): room for a couple of hundred resized
 * photos, small enough that reading it cannot exhaust a phone's memory.
 */
export const MAX_BACKUP_CHARS = 100_000_000;

/** Most checks one backup may hold; more means the file is not ours. */
export const MAX_BACKUP_RECORDS = 5_000;

/** Added to the title of an imported check kept beside a different one with the same id. */
export const IMPORTED_SUFFIX = ' (imported)';

/** Oldest revisions are dropped past this many, so one record cannot fill the disk. */
export const MAX_REVISIONS = 50;

/** The single draft slot: one current draft of the check form. */
export const DRAFT_SLOT = 'current';

/** Keys in the `meta` store. */
export const META_KEYS = {
	settings: 'settings',
	persistAsked: 'persist-asked',
	installExplained: 'install-explained'
} as const;

/** Shape version written into every photo record. */
export const PHOTO_SCHEMA_VERSION = 1;

/** Image types a stored photo may have (the device writes JPEG; the others are accepted back). */
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;

/** Largest stored photo (3 MB): a resized photo is a few hundred kB, so more means not resized. */
export const MAX_PHOTO_BYTES = 3_000_000;

/** Largest side of a stored photo, in pixels: far above what the device resizes to. */
export const MAX_PHOTO_SIDE = 4096;

/** Most photos one check may hold, so one check cannot fill the phone. */
export const MAX_PHOTOS_PER_CHECK = 30;

/** Longest photo caption, in characters. */
export const MAX_CAPTION_CHARS = 200;

/** Most photos one backup may hold. */
export const MAX_BACKUP_PHOTOS = 5_000;
