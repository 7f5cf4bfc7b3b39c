/**
 * Saved checks, drafts, settings and backups in IndexedDB. The only storage API the UI uses:
 * open a store once with `openStore`, then pass it to the calls below. Every call returns an
 * outcome union; none throws for an expected failure (full disk, closed or read-only store).
 */
export type { CaseFile } from './case-file';
export { CASE_FORMAT, isCaseLike, readSectionDesignation } from './case-file';
export {
	BACKUP_FORMAT,
	BACKUP_VERSION,
	DB_NAME,
	DB_VERSION,
	MAX_BACKUP_CHARS,
	MAX_CAPTION_CHARS,
	MAX_PHOTOS_PER_CHECK,
	PHOTO_SCHEMA_VERSION,
	RECORD_SCHEMA_VERSION
} from './constants';
export type { OpenStoreOptions, OpenStoreResult, StoreStatus } from './db';
export { CheckStore, openStore } from './db';
export type {
	CheckRecord,
	ClockOptions,
	ComputedVerdict,
	PhotoRecord,
	PhotoType,
	Place,
	Revision,
	StoreFailureReason,
	StoreResult,
	VerdictStamp
} from './types';
export type { CheckChanges, ListOptions, NewCheck, SavedCheck } from './records';
export { duplicateCheck, getCheck, listChecks, saveCheck, updateCheck } from './records';
export type { DeletedCheck } from './deletion';
export { deleteCheck, purgeDeleted, undoDelete } from './deletion';
export type { DraftInput, DraftRecord } from './drafts';
export { clearDraft, loadDraft, saveDraft } from './drafts';
export type { BackupFile, ExportOptions, ImportOptions, ImportResult } from './backup';
export { exportBackup, importBackup } from './backup';
export type { ImportCounts } from './backup-merge';
export type { CheckPhoto, NewPhoto } from './photos';
export { addPhoto, listPhotos, removePhoto, setPhotoCaption } from './photos';
export type { Recompute, VerdictUpdate } from './verdicts';
export { needsVerdict, storeVerdicts } from './verdicts';
export type { PersistenceAnswer } from './persist';
export {
	markInstallExplained,
	requestPersistence,
	requestPersistenceOnce,
	shouldExplainInstall
} from './persist';
export type { Combination, FactorSet, LateralRestraint, Settings, Theme } from './settings-model';
export {
	BUILT_IN_FACTOR_SETS,
	DEFAULT_SETTINGS,
	findActiveFactorSet,
	isFactorSet,
	listFactorSets,
	sanitizeSettings,
	withFactorSet,
	withoutFactorSet
} from './settings-model';
export { loadSettings, saveSettings } from './settings';
