import { describeIncomplete, findShapeProblem, openSharedCase } from '$lib/share';
import {
	getCheck,
	loadDraft,
	markInstallExplained,
	saveCheck,
	shouldExplainInstall,
	updateCheck,
	type CheckRecord,
	type FactorSet,
	type Place,
	type Settings
} from '$lib/storage';
import { applySettingsDefaults } from './case-defaults';
import { asCaseFile, asStoredCase, type CaseFile } from './case-file';
import { CheckForm } from './check-form.svelte';
import { createBlankCase, createDemoCase } from './demo-case';
import { DraftKeeper, readDraft } from './draft-keeper';
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
	source = $state<CheckSource>('demo');
	/** Plain message after open/save (e.g. a damaged link, storage refused). */
	message = $state('');
	/** Shown once after the first save: what installing to the home screen does. */
	explainInstall = $state(false);
	saving = $state(false);
	/** True once `open` has put a case in the form. */
	ready = $state(false);

	/** Opens what the address asks for: ?id= a saved check, #c= a shared link, else the draft or the demo. */
	async open(url: URL, defaults: { settings: Settings; set: FactorSet }): Promise<void> {
		try {
			await this.#open(url, defaults);
		} catch (error) {
			// Never leave the screen without a case: say what failed and start from the demo.
			this.message = `The check could not be opened: ${error instanceof Error ? error.message : String(error)}`;
			this.source = 'demo';
			this.form.load(createDemoCase());
		} finally {
			this.ready = true;
		}
	}

	async #open(url: URL, defaults: { settings: Settings; set: FactorSet }): Promise<void> {
		const [store, tools] = await Promise.all([connectStore(), loadEngineTools()]);
		this.tools = tools;
		const draft = store ? await loadDraft(store) : null;
		const restored = draft?.ok && draft.value ? readDraft(draft.value.form) : null;
		const id = url.searchParams.get('id');
		if (id && store) {
			const found = await getCheck(store, id);
			const problem = found.ok ? findShapeProblem(found.value.input) : null;
			if (found.ok && problem) {
				this.message = describeIncomplete(problem, 'record');
			} else if (found.ok) {
				this.record = found.value;
				this.source = 'saved';
				// Edits in progress on this very check (e.g. before a reload) win over the stored copy.
				if (restored?.savedId === id) this.form.load(restored.case, { savedId: id, texts: restored.texts, units: restored.units });
				else this.form.load(asCaseFile(found.value.input), { savedId: id });
				return;
			} else this.message = found.message;
		}
		if (url.hash.includes('c=')) {
			const decoded = openSharedCase(url.hash);
			if (decoded.ok) {
				this.source = 'link';
				this.form.load(asCaseFile(decoded.value));
				return;
			}
			this.message = decoded.issues.map((issue) => issue.message).join(' ');
		}
		if (restored && restored.savedId === null) {
			this.source = 'draft';
			this.form.load(restored.case, { texts: restored.texts, units: restored.units });
			return;
		}
		if (!store) this.message = 'This browser does not let the app store data: checks cannot be saved here.';
		// The last draft belonged to a saved check (it is kept there): a new check starts empty.
		if (restored) this.startBlank(defaults);
		else {
			this.source = 'demo';
			this.form.load(createDemoCase());
		}
	}

	/** Starts again from an empty form with the user's defaults (the draft follows). */
	startBlank(defaults: { settings: Settings; set: FactorSet }): void {
		this.record = null;
		this.source = 'blank';
		this.form.load(applySettingsDefaults(createBlankCase(), defaults.settings, defaults.set));
		this.form.schedule();
	}

	startDemo(): void {
		this.record = null;
		this.source = 'demo';
		this.form.load(createDemoCase());
		this.form.schedule();
	}

	/** Saves a new check, or the edited one with a revision of its previous state. */
	async save(details: { title: string; place: Place; notes: string }): Promise<boolean> {
		const store = await connectStore();
		if (!store) {
			this.message = 'Storage is not available in this browser; the check was not saved.';
			return false;
		}
		this.saving = true;
		await this.form.runNow();
		const outcome = this.form.outcome;
		const result = outcome?.state === 'report' ? outcome.report : null;
		const input = $state.snapshot(this.form.case) as CaseFile;
		input.title = details.title;
		this.form.case.title = details.title;
		try {
			if (this.record) {
				const updated = await updateCheck(store, this.record.id, {
					...details,
					input: asStoredCase(input),
					result,
					engineVersion: ENGINE_VERSION
				});
				if (!updated.ok) return this.#fail(updated.message);
				this.record = updated.value;
				this.message = `Saved. ${updated.value.revisions.length} earlier version${updated.value.revisions.length === 1 ? '' : 's'} kept.`;
			} else {
				const saved = await saveCheck(store, { ...details, input: asStoredCase(input), result, engineVersion: ENGINE_VERSION });
				if (!saved.ok) return this.#fail(saved.message);
				this.record = saved.value.record;
				this.message = describePersistence(saved.value.persistence);
				const explain = await shouldExplainInstall(store);
				this.explainInstall = explain.ok && explain.value;
			}
			this.form.savedId = this.record.id;
			await this.drafts.flush(this.form.snapshot());
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
		this.message = `Not saved: ${message}`;
		return false;
	}
}

function describePersistence(answer: 'granted' | 'denied' | 'unsupported' | null): string {
	if (answer === 'granted') return 'Saved. This browser has agreed to keep your checks.';
	if (answer === null) return 'Saved.';
	return 'Saved. This browser may clear stored data when space runs low: export a backup now and then.';
}
