import {
	deleteCheck,
	duplicateCheck,
	exportBackup,
	importBackup,
	listChecks,
	needsVerdict,
	purgeDeleted,
	storeVerdicts,
	undoDelete,
	MAX_BACKUP_CHARS,
	type CheckRecord,
	type CheckStore,
	type ComputedVerdict,
	type DeletedCheck,
	type Recompute,
	type VerdictUpdate
} from '$lib/storage';
import { version as APP_VERSION } from '../../../../package.json';
import { describeImport } from './import-summary';
import { connectStore } from './store-connection';

/** Deleted checks stay restorable this long, then go for good (keeps the database small). */
const KEEP_DELETED_DAYS = 30;

/** Said plainly wherever saving is offered when the browser refuses storage. */
export const NO_STORAGE_MESSAGE =
	'Checks cannot be saved on this device right now: the browser is not letting Hingepoint store data (private browsing, or storage turned off). You can still check a beam; copy or share the result before you leave.';

/** What the list shows for a check: the app's own verdict, or 'pending' while it is computed. */
export type ListedVerdict = ComputedVerdict | 'pending';

/** The engine, reached only through what the list needs (tests pass their own). */
export interface VerdictEngine {
	loadVersion: () => Promise<string>;
	loadRecompute: () => Promise<Recompute>;
}

// Loaded on demand, so the list screen stays small when every verdict is current.
const defaultEngine: VerdictEngine = {
	loadVersion: async () => (await import('./engine-version')).ENGINE_VERSION,
	loadRecompute: async () => (await import('./recompute-verdict')).recomputeVerdict
};

/**
 * The saved-checks screen: the list (newest first) with the app's own verdicts, search,
 * duplicate, delete with undo, and backup export/import.
 */
export class SavedChecks {
	records = $state.raw<CheckRecord[]>([]);
	search = $state('');
	loaded = $state(false);
	/** The last deletion, offered for undo until the next one. */
	deleted = $state.raw<DeletedCheck | null>(null);
	/** Plain result of the last list action (a copy, an undo, a storage failure). */
	message = $state('');
	/** Plain result of the last import, shown beside the import control. */
	importMessage = $state('');
	importing = $state(false);
	available = $state(true);
	/** Verdicts computed here but not (yet) stored, by record id and updatedAt. */
	fresh = $state.raw<Record<string, ComputedVerdict>>({});
	engineVersion = $state<string | null>(null);
	#purged = false;
	#connect: () => Promise<CheckStore | null>;
	#engine: VerdictEngine;

	constructor(deps: { connect?: () => Promise<CheckStore | null>; engine?: VerdictEngine } = {}) {
		this.#connect = deps.connect ?? connectStore;
		this.#engine = deps.engine ?? defaultEngine;
	}

	/** The verdict to list: only one this app computed with its current engine. */
	verdictOf(record: CheckRecord): ListedVerdict {
		if (this.engineVersion === null) return 'pending';
		const stored = record.computed;
		if (stored && !needsVerdict(record, this.engineVersion)) return stored.verdict;
		return this.fresh[freshKey(record)] ?? 'pending';
	}

	async refresh(): Promise<void> {
		const store = await this.#connect();
		this.available = store !== null;
		if (!store) {
			this.loaded = true;
			this.message = NO_STORAGE_MESSAGE;
			return;
		}
		if (!this.#purged) {
			this.#purged = true;
			// eslint-disable-next-line svelte/prefer-svelte-reactivity -- a one-off cut-off date, not state
			const before = new Date(Date.now() - KEEP_DELETED_DAYS * 86_400_000);
			// A failed purge loses nothing: the deleted checks simply stay until the next visit.
			await purgeDeleted(store, { before });
		}
		const listed = await listChecks(store, { search: this.search });
		if (listed.ok) this.records = listed.value;
		else this.message = listed.message;
		this.loaded = true;
		await this.#fillVerdicts(store);
	}

	// Computes the verdicts that are missing or from another engine, then stores them. A failed
	// store (read-only, full disk) still shows them: they are kept in `fresh` for this visit.
	async #fillVerdicts(store: CheckStore): Promise<void> {
		this.engineVersion ??= await this.#engine.loadVersion();
		const version = this.engineVersion;
		const stale = this.records.filter(
			(r) => needsVerdict(r, version) && this.fresh[freshKey(r)] === undefined
		);
		if (stale.length === 0) return;
		const recompute = await this.#engine.loadRecompute();
		const updates: VerdictUpdate[] = [];
		for (const record of stale) {
			const verdict = await safely(recompute, record.input);
			this.fresh = { ...this.fresh, [freshKey(record)]: verdict };
			const computed = { verdict, computedBy: version };
			updates.push({ id: record.id, updatedAt: record.updatedAt, computed });
			await nextTurn();
		}
		await storeVerdicts(store, updates);
	}

	async setSearch(text: string): Promise<void> {
		this.search = text;
		await this.refresh();
	}

	async duplicate(id: string): Promise<void> {
		const store = await this.#connect();
		if (!store) return;
		const copy = await duplicateCheck(store, id);
		this.message = copy.ok ? `Copied as “${copy.value.title}”.` : copy.message;
		await this.refresh();
	}

	async remove(id: string): Promise<void> {
		const store = await this.#connect();
		if (!store) return;
		const gone = await deleteCheck(store, id);
		if (gone.ok) {
			this.deleted = gone.value;
			this.message = '';
		} else this.message = gone.message;
		await this.refresh();
	}

	async undo(): Promise<void> {
		const store = await this.#connect();
		if (!store || !this.deleted) return;
		const back = await undoDelete(store, this.deleted.id);
		this.message = back.ok ? `“${back.value.title}” is back.` : back.message;
		this.deleted = null;
		await this.refresh();
	}

	/** The backup as text with a file name, or null (message set) when it could not be made. */
	// eslint-disable-next-line svelte/prefer-svelte-reactivity -- a one-off timestamp, not state
	async exportAll(now = new Date()): Promise<{ name: string; text: string } | null> {
		const store = await this.#connect();
		if (!store) return null;
		const engineVersion = await this.#engine.loadVersion();
		const made = await exportBackup(store, { appVersion: APP_VERSION, engineVersion, now });
		if (!made.ok) {
			this.message = made.message;
			return null;
		}
		this.message = `Backup of ${this.records.length} check${this.records.length === 1 ? '' : 's'} made.`;
		return { name: `hingepoint-backup-${now.toISOString().slice(0, 10)}.json`, text: made.value };
	}

	/** Imports a chosen file; one too large is refused before it is read into memory. */
	async importFile(file: { size: number; text: () => Promise<string> }): Promise<void> {
		if (file.size > MAX_BACKUP_CHARS) {
			const mb = Math.round(MAX_BACKUP_CHARS / 1e6);
			this.importMessage = `Backup refused, nothing changed: this file is larger than any backup (over ${mb} MB).`;
			return;
		}
		let text: string;
		try {
			text = await file.text();
		} catch {
			this.importMessage = 'Backup refused, nothing changed: the file could not be read.';
			return;
		}
		await this.importFrom(text);
	}

	async importFrom(text: string): Promise<void> {
		const store = await this.#connect();
		if (!store) {
			this.importMessage = `Nothing imported. ${NO_STORAGE_MESSAGE}`;
			return;
		}
		this.importing = true;
		this.importMessage = 'Reading the backup and checking every case again…';
		try {
			const [engineVersion, recompute] = await Promise.all([
				this.#engine.loadVersion(),
				this.#engine.loadRecompute()
			]);
			const options = { engineVersion, recompute: yielding(recompute) };
			const result = await importBackup(store, text, options);
			this.importMessage = describeImport(result);
		} catch {
			this.importMessage =
				'Nothing imported: the app could not load its engine. Reload the app and try again.';
		} finally {
			this.importing = false;
		}
		await this.refresh();
	}
}

// Lets the screen paint between checks of a long list.
function nextTurn(): Promise<void> {
	return new Promise((resolve) => setTimeout(resolve, 0));
}

function yielding(recompute: Recompute): Recompute {
	return async (input) => {
		await nextTurn();
		return recompute(input);
	};
}

function freshKey(record: CheckRecord): string {
	return `${record.id}@${record.updatedAt}`;
}

async function safely(recompute: Recompute, input: unknown): Promise<ComputedVerdict> {
	try {
		return await recompute(input);
	} catch {
		return 'needs-attention';
	}
}
