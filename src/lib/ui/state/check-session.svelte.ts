import { describeIncomplete, findShapeProblem, openSharedCase } from '$lib/share';
import {
	getCheck,
	listChecks,
	markInstallExplained,
	saveCheck,
	shouldExplainInstall,
	updateCheck,
	type CheckRecord,
	type CheckStore,
	type FactorSet,
	type Place,
	type Settings
} from '$lib/storage';
import { applySettingsDefaults } from './case-defaults';
import { asCaseFile, asStoredCase, type CaseFile } from './case-file';
import { CheckForm, type FormDraft } from './check-form.svelte';
import { createBlankCase, createDemoCase } from './demo-case';
import { loadDraft, moveDraft } from '$lib/storage/drafts';
import { DraftKeeper, draftSlot, readDraft } from './draft-keeper';
import { DraftShelf } from './draft-shelf.svelte';
import { findSaveBlock } from './save-block';
import { stampReport } from './verdict-stamp';
import { ENGINE_VERSION } from './engine-version';
import { loadEngineTools, type EngineTools } from './engine-tools';
import { EngineRunner } from './engine-runner';
import { connectStore } from './store-connection';

/** Where the form's case came from when the page opened. */
export type CheckSource = 'saved' | 'link' | 'draft' | 'demo' | 'blank';

/**
 * The check screen's session: the form, the saved record being edited (if any), draft keeping,
 * saving with revisions, and the one-time storage and install messages.
 */
export class CheckSession {
	readonly drafts = new DraftKeeper();
	readonly engine = new EngineRunner();
	readonly form: CheckForm = new CheckForm({
		// The share texts come in the units the form shows.
		run: (c) => this.engine.run(c, this.form.units === 'US' ? 'us' : 'si', false),
		runCurve: (c) => this.engine.run(c, this.form.units === 'US' ? 'us' : 'si', true),
		onchange: (draft) => this.drafts.queue(draft)
	});
	/** The engine, once loaded. */
	tools = $state.raw<EngineTools | null>(null);
	record = $state.raw<CheckRecord | null>(null);
	source = $state<CheckSource>('blank');
	/** Plain message after opening (e.g. a damaged link, storage refused). */
	message = $state('');
	/** The answer to the last save, shown and read out beside the save button. */
	saveStatus = $state('');
	/** How the unsaved edits came (a kept draft, a restored version); said while they last. */
	unsavedNote = $state('');
	/**
	 * True as soon as the form differs from the saved check on screen (a field typed, a choice
	 * made, a version restored), and again false once saved or taken back.
	 */
	edited = $derived.by(() => {
		const record = this.record;
		if (!record) return false;
		if (Object.keys(this.form.local).length > 0) return true;
		return JSON.stringify(this.form.case) !== JSON.stringify(record.input);
	});
	/** No check saved on this phone yet: the worked demo is offered. */
	firstRun = $state(false);
	readonly shelf = new DraftShelf();
	/** Shown once after the first save: what installing to the home screen does. */
	explainInstall = $state(false);
	saving = $state(false);
	/** True once `open` has put a case in the form. */
	ready = $state(false);

	/**
	 * Opens what the address asks for: ?new a new blank check (the current unsaved one is set
	 * aside), ?id= a saved check (with its unsaved edits, said on screen), #c= a shared link, else
	 * the new check in progress or a blank one.
	 */
	async open(url: URL, defaults: { settings: Settings; set: FactorSet }): Promise<void> {
		// The latest open wins: an earlier one still reading the store must not show its check
		// over the one asked for since ("New check" tapped while a saved check was opening).
		const ticket = ++this.#openTicket;
		this.ready = false;
		this.message = '';
		this.saveStatus = '';
		this.unsavedNote = '';
		try {
			await this.drafts.flush();
			if (ticket !== this.#openTicket) return;
			await this.#open(url, defaults, () => ticket === this.#openTicket);
		} catch (error) {
			if (ticket !== this.#openTicket) return;
			// Never leave the screen without a case: say what failed and start a blank one.
			this.message = `The check could not be opened: ${error instanceof Error ? error.message : String(error)}`;
			this.#blank(defaults);
		} finally {
			if (ticket === this.#openTicket) this.ready = true;
		}
	}

	#openTicket = 0;

	async #open(
		url: URL,
		defaults: { settings: Settings; set: FactorSet },
		stillAsked: () => boolean
	): Promise<void> {
		const [store, tools] = await Promise.all([connectStore(), loadEngineTools()]);
		this.tools = tools;
		if (!store)
			this.message = 'This browser does not let the app store data: checks cannot be saved here.';
		const current = store ? await this.#currentNewDraft(store) : null;
		const listed = store ? await listChecks(store) : null;
		this.firstRun = !(listed?.ok && listed.value.length > 0);
		await this.shelf.refresh();
		if (!stillAsked()) return;
		const id = url.searchParams.get('id');
		if (url.searchParams.has('new')) {
			if (current) await this.shelf.setAside();
			if (!stillAsked()) return;
			return this.#blank(defaults);
		}
		if (id && store) {
			const found = await getCheck(store, id);
			if (!stillAsked()) return;
			const problem = found.ok ? findShapeProblem(found.value.input) : null;
			if (found.ok && problem) this.message = describeIncomplete(problem, 'record');
			else if (found.ok) return this.#openSaved(store, found.value, stillAsked);
			else this.message = found.message;
		}
		if (url.hash.includes('c=')) {
			const decoded = openSharedCase(url.hash);
			if (decoded.ok) {
				if (current) await this.shelf.setAside();
				if (!stillAsked()) return;
				this.#show('link', null, asCaseFile(decoded.value));
				return;
			}
			this.message = decoded.issues.map((issue) => issue.message).join(' ');
		}
		if (current) {
			this.#show('draft', null, current.case, current);
			return;
		}
		this.#blank(defaults);
	}

	/** The draft of the new check in progress; an older app's draft of a saved check moves to its own slot. */
	async #currentNewDraft(store: CheckStore): Promise<FormDraft | null> {
		const stored = await loadDraft(store);
		const draft = stored.ok && stored.value ? readDraft(stored.value.form) : null;
		if (draft?.savedId) await moveDraft(store, draftSlot(null), draftSlot(draft.savedId));
		return draft && !draft.savedId ? draft : null;
	}

	// Unsaved edits of this check are shown, never hidden, and the screen says they are not saved.
	// The form gets a copy of the saved input: edits must never reach the record it is compared to.
	async #openSaved(
		store: CheckStore,
		record: CheckRecord,
		stillAsked: () => boolean
	): Promise<void> {
		const stored = await loadDraft(store, draftSlot(record.id));
		if (!stillAsked()) return;
		const draft = stored.ok && stored.value ? readDraft(stored.value.form) : null;
		const differs = draft && JSON.stringify(draft.case) !== JSON.stringify(record.input);
		if (draft && differs) {
			this.#show('saved', record, draft.case, draft);
			const at = stored.ok && stored.value ? describeTime(stored.value.savedAt) : '';
			this.unsavedNote = `Unsaved changes from ${at} are shown. Save them, or go back to the saved version.`;
		} else this.#show('saved', record, asCaseFile(structuredClone(record.input)));
	}

	#show(source: CheckSource, record: CheckRecord | null, c: CaseFile, draft?: FormDraft): void {
		this.record = record;
		this.source = source;
		this.form.load(c, { savedId: record?.id ?? null, texts: draft?.texts, units: draft?.units });
	}

	#blank(defaults: { settings: Settings; set: FactorSet }): void {
		this.#show(
			'blank',
			null,
			applySettingsDefaults(createBlankCase(), defaults.settings, defaults.set)
		);
	}

	/** The worked demo, as a new unsaved check (the one in progress is set aside first). */
	async startDemo(): Promise<void> {
		await this.drafts.flush();
		await this.shelf.setAside();
		this.#show('demo', null, createDemoCase());
	}

	/** Takes a set-aside new check back into the form; the one in progress is set aside. */
	async reopenAside(slot: string): Promise<void> {
		await this.drafts.flush();
		if (!this.record) await this.shelf.setAside();
		const draft = await this.shelf.takeBack(slot);
		if (draft) this.#show('draft', null, draft.case, draft);
	}

	/** Puts an earlier version of this check in the form, as an unsaved edit of the same check. */
	restoreRevision(index: number): void {
		const record = this.record;
		const revision = record?.revisions[index];
		if (!record || !revision) return;
		this.form.load(asCaseFile(structuredClone(revision.input)), { savedId: record.id });
		this.drafts.queue(this.form.snapshot());
		this.unsavedNote = `Version ${index + 1} is in the form, not saved yet. Saving keeps the version saved now in the list.`;
	}

	/** Drops the unsaved edits of this saved check (the user asked) and shows it as saved. */
	async showSaved(): Promise<void> {
		const record = this.record;
		if (!record) return;
		await this.drafts.discard(record.id);
		this.#show('saved', record, asCaseFile(structuredClone(record.input)));
		this.unsavedNote = '';
	}

	/** Saves a finished check (a new one, or the edited one with a revision of its previous state). */
	async save(details: { title: string; place: Place; notes: string }): Promise<boolean> {
		this.saveStatus = '';
		const store = await connectStore();
		if (!store) {
			this.saveStatus = 'Storage is not available in this browser; the check was not saved.';
			return false;
		}
		this.saving = true;
		try {
			await this.form.runNow();
			// Only a check with a result is saved; an incomplete one stays a draft.
			const block = findSaveBlock(this.form.problems, this.form.outcome);
			const outcome = this.form.outcome;
			if (block || outcome?.state !== 'report')
				return this.#fail(`${block?.reason ?? 'No result yet'}. It is kept as a draft`);
			const input = $state.snapshot(this.form.case) as CaseFile;
			input.title = details.title;
			this.form.case.title = details.title;
			const wasNew = this.record === null;
			if (this.record) {
				const updated = await updateCheck(store, this.record.id, {
					...details,
					input: asStoredCase(input),
					result: outcome.report,
					computed: stampReport(outcome.report),
					engineVersion: ENGINE_VERSION
				});
				if (!updated.ok) return this.#fail(updated.message);
				this.record = updated.value;
				const kept = updated.value.revisions.length;
				this.saveStatus = `Saved. ${kept} earlier version${kept === 1 ? '' : 's'} kept.`;
			} else {
				const saved = await saveCheck(store, {
					...details,
					input: asStoredCase(input),
					result: outcome.report,
					computed: stampReport(outcome.report),
					engineVersion: ENGINE_VERSION
				});
				if (!saved.ok) return this.#fail(saved.message);
				this.record = saved.value.record;
				this.saveStatus = describePersistence(saved.value.persistence);
				const explain = await shouldExplainInstall(store);
				this.explainInstall = explain.ok && explain.value;
			}
			this.firstRun = false;
			this.unsavedNote = '';
			this.source = 'saved';
			this.form.savedId = this.record.id;
			// What was saved needs no draft: the new check's slot is free for the next one.
			if (wasNew) await this.drafts.discard(null);
			await this.drafts.discard(this.record.id);
			return true;
		} finally {
			this.saving = false;
		}
	}

	async dismissInstallNote(): Promise<void> {
		this.explainInstall = false;
		const store = await connectStore();
		if (store) await markInstallExplained(store);
	}

	#fail(message: string): false {
		this.saveStatus = `Not saved: ${message}.`;
		return false;
	}
}

function describePersistence(answer: 'granted' | 'denied' | 'unsupported' | null): string {
	if (answer === 'granted') return 'Saved. This browser has agreed to keep your checks.';
	if (answer === null) return 'Saved.';
	return 'Saved. This browser may clear stored data when space runs low: export a backup now and then.';
}

function describeTime(iso: string): string {
	return new Date(iso).toLocaleString();
}
