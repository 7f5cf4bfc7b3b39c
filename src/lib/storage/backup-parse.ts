import { findHostileShape } from './backup-guard';
import { readBackupPhotos } from './backup-photos';
import { isPlainObject } from './case-file';
import { BACKUP_FORMAT, BACKUP_VERSION, MAX_BACKUP_CHARS, MAX_BACKUP_RECORDS } from './constants';
import { upgradeRecord } from './record-upgrade';
import type { CheckRecord, PhotoRecord, Revision } from './types';
import { findRecordProblem } from './validate-record';

/** Why a backup file was refused. */
export type BackupRefusal = { ok: false; reason: 'damaged' | 'foreign' | 'newer'; message: string };

/** A backup read and checked in full, its records brought to the current shape. */
export type ParsedBackup =
	{ ok: true; records: CheckRecord[]; photos: PhotoRecord[] } | BackupRefusal;

/**
 * Reads a backup file's text and checks all of it before anything is written: damaged (not
 * JSON, cut short, a bad record, too big, hostile keys), foreign (another format) and newer files
 * are refused. Records come back with only the fields we know, no deletion mark and no computed
 * verdict: nothing in a file may hide a check or claim a verdict. Pure; no storage is touched.
 */
export function parseBackup(text: string): ParsedBackup {
	if (text.length > MAX_BACKUP_CHARS) {
		const mb = Math.round(MAX_BACKUP_CHARS / 1e6);
		return refuse(
			'damaged',
			`This file is larger than any backup (over ${mb} MB). Nothing was imported.`
		);
	}
	let data: unknown;
	try {
		data = JSON.parse(text);
	} catch {
		return refuse(
			'damaged',
			'This file is damaged or cut short: it is not readable JSON. Nothing was imported.'
		);
	}
	const hostile = findHostileShape(data);
	if (hostile) {
		return refuse(
			'damaged',
			`This file holds something no Hingepoint backup has (${hostile}). Nothing was imported.`
		);
	}
	if (!isPlainObject(data) || data.format !== BACKUP_FORMAT) {
		const isCase = isPlainObject(data) && data.format === 'hingepoint.case';
		return refuse(
			'foreign',
			isCase
				? 'This is a single Hingepoint case, not a backup. Open it from the check screen instead. Nothing was imported.'
				: 'This is not a Hingepoint backup file. Nothing was imported.'
		);
	}
	if (!Number.isInteger(data.version) || (data.version as number) < 1) {
		return refuse('damaged', 'This backup has no valid version number. Nothing was imported.');
	}
	if ((data.version as number) > BACKUP_VERSION) {
		return refuse(
			'newer',
			'This backup was made by a newer version of Hingepoint. Update the app, then import it again.'
		);
	}
	if (!Array.isArray(data.records)) {
		return refuse('damaged', 'This backup has no list of checks. Nothing was imported.');
	}
	if (data.records.length > MAX_BACKUP_RECORDS) {
		return refuse(
			'damaged',
			`This backup lists more than ${MAX_BACKUP_RECORDS} checks, more than any phone holds. Nothing was imported.`
		);
	}
	const records = readRecords(data.records);
	if (!records.ok) return records;
	// Version 1 files had no photos.
	const ids = new Set(records.records.map((r) => r.id));
	const photos = readBackupPhotos(data.version === 1 ? undefined : data.photos, ids);
	if (!photos.ok) return photos;
	return { ok: true, records: records.records, photos: photos.photos };
}

function readRecords(raw: unknown[]): { ok: true; records: CheckRecord[] } | BackupRefusal {
	const records: CheckRecord[] = [];
	const seen = new Set<string>();
	for (let i = 0; i < raw.length; i++) {
		const upgraded = upgradeRecord(raw[i]);
		if (!upgraded.ok && upgraded.reason === 'newer') {
			return refuse(
				'newer',
				`Check ${i + 1} in this backup was saved by a newer version of Hingepoint. Update the app, then import again.`
			);
		}
		const problem = findRecordProblem(raw[i], `records[${i}]`);
		if (!upgraded.ok || problem) {
			const where = problem ?? 'no schema version';
			return refuse(
				'damaged',
				`This backup is damaged at check ${i + 1} (${where}). Nothing was imported.`
			);
		}
		if (seen.has(upgraded.record.id)) {
			return refuse('damaged', `This backup lists check ${i + 1} twice. Nothing was imported.`);
		}
		seen.add(upgraded.record.id);
		records.push(pickRecord(upgraded.record));
	}
	return { ok: true, records };
}

// Only the fields we know, so nothing unexpected is stored. The deletion mark is dropped (an
// imported check is always live) and the verdict is left for this app to compute.
function pickRecord(r: CheckRecord): CheckRecord {
	return {
		id: r.id,
		schemaVersion: r.schemaVersion,
		title: r.title,
		place: { building: r.place.building, level: r.place.level, grid: r.place.grid },
		notes: r.notes,
		createdAt: r.createdAt,
		updatedAt: r.updatedAt,
		engineVersion: r.engineVersion,
		input: r.input,
		result: r.result,
		computed: null,
		revisions: r.revisions.map(pickRevision),
		deletedAt: null
	};
}

function pickRevision(r: Revision): Revision {
	return { savedAt: r.savedAt, input: r.input, result: r.result, engineVersion: r.engineVersion };
}

function refuse(reason: BackupRefusal['reason'], message: string): BackupRefusal {
	return { ok: false, reason, message };
}
