import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { upgradeRecord, RECORD_UPGRADERS } from '../../../src/lib/storage/record-upgrade';
import { RECORD_SCHEMA_VERSION } from '../../../src/lib/storage/constants';
import { STORE_MIGRATIONS } from '../../../src/lib/storage/migrations';
import { findRecordProblem } from '../../../src/lib/storage/validate-record';
import fixture from '../../fixtures/db/checks-v1.json';

function lacksSchemaVersion(value: unknown): boolean {
	return !(typeof value === 'object' && value !== null && 'schemaVersion' in value);
}

describe('record upgraders', () => {
	it('number store migrations and record upgraders by exactly one, never reused', () => {
		expect(STORE_MIGRATIONS.map((m) => m.version)).toEqual(STORE_MIGRATIONS.map((_, i) => i + 1));
		expect(RECORD_UPGRADERS.map((u) => u.from)).toEqual(RECORD_UPGRADERS.map((_, i) => i + 1));
		expect(RECORD_UPGRADERS.length + 1).toBe(RECORD_SCHEMA_VERSION);
	});

	it('brings every frozen v1 record to a valid current record without mutating it', () => {
		for (const [i, v1] of fixture.records.entries()) {
			const frozen = structuredClone(v1);
			const upgraded = upgradeRecord(v1);
			expect(upgraded.ok).toBe(true);
			if (!upgraded.ok) continue;
			expect(upgraded.upgraded).toBe(true);
			expect(upgraded.record.schemaVersion).toBe(RECORD_SCHEMA_VERSION);
			expect(findRecordProblem(upgraded.record, `records[${i}]`)).toBeNull();
			expect(v1).toEqual(frozen);
		}
	});

	it('leaves a current record as it is', () => {
		const once = upgradeRecord(fixture.records[0]);
		if (!once.ok) throw new Error(once.message);
		const twice = upgradeRecord(once.record);
		expect(twice).toEqual({ ok: true, record: once.record, upgraded: false });
	});

	it('refuses a newer record and a record without a schema version', () => {
		const future = { ...fixture.records[0], schemaVersion: RECORD_SCHEMA_VERSION + 1 };
		expect(upgradeRecord(future)).toMatchObject({ ok: false, reason: 'newer' });
		fc.assert(
			fc.property(fc.anything().filter(lacksSchemaVersion), (raw) => {
				expect(upgradeRecord(raw)).toMatchObject({ ok: false, reason: 'damaged' });
			})
		);
	});
});
