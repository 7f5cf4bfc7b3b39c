import { isPlainObject } from './case-file';
import { BACKUP_FORMAT, BACKUP_VERSION } from './constants';
import { upgradeRecord } from './record-upgrade';
import type { CheckRecord } from './types';
import { findRecordProblem } from './validate-record';

/** Why a backup file was refused. */
export type BackupRefusal = { ok: false; reason: 'damaged' | 'foreign' | 'newer'; message: string };

/** A backup read and checked in full, its records brought to the current shape. */
export type ParsedBackup = { ok: true; records: CheckRecord[] } | BackupRefusal;

/**
 * Reads a backup file's text and checks all of it before anything is written: damaged (not
 * JSON, cut short, a bad record), foreign (another format) and newer files are refused.
 * Pure; no storage is touched.
 */
export function parseBackup(text: string): ParsedBackup {
	let data: unknown;
	try {
		data = JSON.parse(text);
	} catch {
		return refuse(
			'damaged',
			'This file is damaged or cut short: it is not readable JSON. Nothing was imported.'
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
	return readRecords(data.records);
}

function readRecords(raw: unknown[]): ParsedBackup {
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
		records.push(upgraded.record);
	}
	return { ok: true, records };
}

function refuse(reason: BackupRefusal['reason'], message: string): BackupRefusal {
	return { ok: false, reason, message };
}
