/** Default IndexedDB database name; tests pass their own so each gets a fresh database. */
export const DB_NAME = 'hingepoint';

/**
 * IndexedDB version this code creates and reads. Never reuse a number: v1 first stores; v2 split
 * the place into building, level and grid and added the newest-first index; v3 rewrote records
 * with an empty computed-verdict slot.
 */
export const DB_VERSION = 3;

/** Shape version written into every check record (see migrations.ts for the upgraders). */
export const RECORD_SCHEMA_VERSION = 3;

/** Backup file format name and version (our own). */
export const BACKUP_FORMAT = 'hingepoint.backup';
export const BACKUP_VERSION = 1;

/**
 * Largest backup read, in characters (about 40 MB): far above a phone's worth of checks, small
 * enough that reading it cannot exhaust a phone's memory.
 */
export const MAX_BACKUP_CHARS = 40_000_000;

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
