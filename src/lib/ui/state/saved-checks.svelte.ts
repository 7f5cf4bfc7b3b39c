import {
	deleteCheck,
	duplicateCheck,
	exportBackup,
	importBackup,
	listChecks,
	purgeDeleted,
	undoDelete,
	type CheckRecord,
	type DeletedCheck
} from '$lib/storage';
import { version as APP_VERSION } from '../../../../package.json';
import { connectStore } from './store-connection';

/** Deleted checks stay restorable this long, then go for good (keeps the database small). */
const KEEP_DELETED_DAYS = 30;

/**
 * The saved-checks screen: the list (newest first) with search, duplicate, delete with undo,
 * and backup export/import with the storage layer's own messages.
 */
export class SavedChecks {
	records = $state.raw<CheckRecord[]>([]);
	search = $state('');
	loaded = $state(false);
	/** The last deletion, offered for undo until the next one. */
	deleted = $state.raw<DeletedCheck | null>(null);
	/** Plain result of the last action (import counts, a refusal, a storage failure). */
	message = $state('');
	available = $state(true);
	#purged = false;

	async refresh(): Promise<void> {
		const store = await connectStore();
		this.available = store !== null;
		if (!store) {
			this.loaded = true;
			this.message = 'This browser does not let the app store data, so saved checks are not available here.';
			return;
		}
		if (!this.#purged) {
			this.#purged = true;
			const before = new Date(Date.now() - KEEP_DELETED_DAYS * 86_400_000);
			// A failed purge loses nothing: the deleted checks simply stay until the next visit.
			await purgeDeleted(store, { before });
		}
		const listed = await listChecks(store, { search: this.search });
		if (listed.ok) this.records = listed.value;
		else this.message = listed.message;
		this.loaded = true;
	}

	async setSearch(text: string): Promise<void> {
		this.search = text;
		await this.refresh();
	}

	async duplicate(id: string): Promise<void> {
		const store = await connectStore();
		if (!store) return;
		const copy = await duplicateCheck(store, id);
		this.message = copy.ok ? `Copied as “${copy.value.title}”.` : copy.message;
		await this.refresh();
	}

	async remove(id: string): Promise<void> {
		const store = await connectStore();
		if (!store) return;
		const gone = await deleteCheck(store, id);
		if (gone.ok) {
			this.deleted = gone.value;
			this.message = '';
		} else this.message = gone.message;
		await this.refresh();
	}

	async undo(): Promise<void> {
		const store = await connectStore();
		if (!store || !this.deleted) return;
		const back = await undoDelete(store, this.deleted.id);
		this.message = back.ok ? `“${back.value.title}” is back.` : back.message;
		this.deleted = null;
		await this.refresh();
	}

	/** The backup as text with a file name, or null (message set) when it could not be made. */
	async exportAll(now = new Date()): Promise<{ name: string; text: string } | null> {
		const store = await connectStore();
		if (!store) return null;
		// The engine is loaded only for its version string, so the list screen stays small.
		const { ENGINE_VERSION } = await import('./engine-version');
		const made = await exportBackup(store, { appVersion: APP_VERSION, engineVersion: ENGINE_VERSION, now });
		if (!made.ok) {
			this.message = made.message;
			return null;
		}
		this.message = `Backup of ${this.records.length} check${this.records.length === 1 ? '' : 's'} made.`;
		return { name: `hingepoint-backup-${now.toISOString().slice(0, 10)}.json`, text: made.value };
	}

	async importFrom(text: string): Promise<void> {
		const store = await connectStore();
		if (!store) return;
		const result = await importBackup(store, text);
		this.message = result.ok
			? `Backup read: ${result.added} added, ${result.updated} updated, ${result.skipped} already here.`
			: `Backup refused, nothing changed: ${result.message}`;
		await this.refresh();
	}
}
