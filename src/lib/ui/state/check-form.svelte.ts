import type { UnitSystem } from '$lib/ui/format';
import { totalLength } from './beam-layout';
import type { CaseFile, CaseLoad } from './case-file';
import { createDemoCase } from './demo-case';
import { describeField } from './field-kinds';
import { readPath, shiftListKeys, writePath } from './field-path';
import { isBlank } from './blank-value';
import { collectGeneral, listProblems, mergeMessages } from './form-messages';
import { formatFieldValue, parseFieldText, readBlankText } from './field-text';
import type { CheckOutcome } from './check-outcome';
import { toSiCase } from './si-case';
import { describeGradeMove, followGrade, type UsualGrade } from './usual-grade';

/** What is kept as the draft: the case plus anything typed that is not (yet) a valid value. */
export interface FormDraft {
	case: CaseFile;
	/** Typed texts by field path, in the display units below. */
	texts: Record<string, string>;
	units: UnitSystem;
	/** The saved check being edited, if any. */
	savedId: string | null;
}

/** How the form runs the engine and reports changes (for the draft). */
export interface CheckFormOptions {
	/** The engine call (may answer later, e.g. from a worker); null while it is not ready yet. */
	run: (c: CaseFile) => CheckOutcome | Promise<CheckOutcome> | null;
	/**
	 * The same check with the governing capacity curve, asked for after the answer is shown (the
	 * curve is one design run per position, so the answer must not wait for it).
	 */
	runCurve?: (c: CaseFile) => CheckOutcome | Promise<CheckOutcome> | null;
	onchange?: (draft: FormDraft) => void;
	/** Quiet time after the last keystroke before the engine runs, ms. */
	delay?: number;
}

/**
 * The check being entered: the case (SI) as $state, the typed texts and their messages, and the
 * outcome as $state.raw — computed once per valid change, after a short quiet time, never per
 * keystroke twice.
 */
export class CheckForm {
	case = $state<CaseFile>(createDemoCase());
	texts = $state<Record<string, string>>({});
	/** Messages found while typing (not a number, must be positive, not in the library …). */
	local = $state<Record<string, string>>({});
	outcome = $state.raw<CheckOutcome | null>(null);
	units = $state<UnitSystem>('SI');
	pending = $state(false);
	savedId = $state<string | null>(null);
	/** The grade was picked in the picker since the case was opened: no change replaces it. */
	gradeByHand = $state(false);
	/** Said under the grade picker after the form moved the grade to the section's usual one. */
	gradeNote = $state<string | null>(null);
	/** Messages by field path: typing problems first, then the engine's input issues. */
	messages = $derived(mergeMessages(this.local, this.outcome, this.case));
	/** Engine issues that belong to no single field. */
	generalIssues = $derived(collectGeneral(this.outcome, this.case));
	/** Every field to fix, first to fix first (the result bar and the save button name it). */
	problems = $derived(listProblems(this.local, this.outcome, this.case));
	#options: CheckFormOptions;
	#timer: ReturnType<typeof setTimeout> | undefined;
	#seq = 0;
	#heldLength: number | undefined;

	constructor(options: CheckFormOptions) {
		this.#options = options;
	}

	/** The text shown in the field at `path`: what was typed, else the stored value in display units. */
	text(path: string): string {
		return (
			this.texts[path] ??
			formatFieldValue(readPath(this.case, path), describeField(path, this.case), this.units)
		);
	}

	/** Takes typed text for a numeric field; a valid number goes into the case in SI. */
	setText(path: string, text: string): void {
		this.texts[path] = text;
		const info = describeField(path, this.case);
		const blank = readBlankText(text, info);
		if (blank.blank) {
			// Whole-beam loads follow the span retyped after it was cleared.
			if (path.startsWith('beam.spans')) this.#heldLength ??= totalLength(this.case.beam);
			// A cleared field holds no value, never the last one typed.
			writePath(this.case, path, blank.value);
			delete this.local[path];
			this.schedule();
			return;
		}
		const parsed = parseFieldText(text, info, this.units);
		if (parsed.ok) {
			const before = this.#heldLength ?? totalLength(this.case.beam);
			writePath(this.case, path, parsed.value);
			if (path.startsWith('beam.spans')) {
				this.#stretchFullLoads(before);
				this.#heldLength = undefined;
			}
			delete this.local[path];
		} else {
			this.local[path] = parsed.message;
		}
		this.schedule();
	}

	/** Records a message for a non-numeric field (or clears it with null). */
	setMessage(path: string, message: string | null): void {
		if (message === null) delete this.local[path];
		else this.local[path] = message;
	}

	/** A structural change (choice, list item added, section mode); field texts are kept. */
	update(mutate: (c: CaseFile) => void): void {
		mutate(this.case);
		this.schedule();
	}

	/** The grade picked by the user (an id or own strengths): kept whatever section follows. */
	pickGrade(grade: CaseFile['beam']['grade']): void {
		this.gradeByHand = true;
		this.gradeNote = null;
		this.forget('beam.grade');
		this.update((c) => (c.beam.grade = grade));
	}

	/**
	 * A change of section or basis that may move the grade: a grade not picked by hand that is
	 * still the usual one of the section before the change (or none) becomes the usual one after
	 * it, and `gradeNote` says so. `usualOf` reads the usual grade (null: none needed or known).
	 */
	updateFollowingGrade(
		mutate: (c: CaseFile) => void,
		usualOf: (c: CaseFile) => UsualGrade | null
	): void {
		const before = usualOf(this.case)?.id;
		mutate(this.case);
		const after = usualOf(this.case);
		const grade = this.case.beam.grade;
		const moved = followGrade({ grade, byHand: this.gradeByHand, before, after });
		if (moved) {
			this.case.beam.grade = moved.id;
			this.forget('beam.grade');
			this.gradeNote = describeGradeMove(moved);
		} else if (!after || grade !== after.id) {
			this.gradeNote = null;
		} else if (this.gradeNote !== null) {
			// Still the usual grade, of the new section now.
			this.gradeNote = describeGradeMove(after);
		}
		this.schedule();
	}

	/** Forgets typed texts under a path prefix (after the fields there were rebuilt). */
	forget(prefix: string): void {
		for (const key of Object.keys(this.texts)) if (key.startsWith(prefix)) delete this.texts[key];
		for (const key of Object.keys(this.local)) if (key.startsWith(prefix)) delete this.local[key];
	}

	/** Sets spans, supports and joints together (a new support arrangement). */
	setBeamLine(line: Pick<CaseFile['beam'], 'spans' | 'supports' | 'joints'>): void {
		const before = totalLength(this.case.beam);
		this.case.beam.spans = line.spans;
		this.case.beam.supports = line.supports;
		this.case.beam.joints = line.joints;
		const bearing = this.case.beam.bearing;
		// One stiff bearing length per support: a new arrangement takes the first one everywhere.
		if (bearing) this.case.beam.bearing = line.supports.map(() => bearing[0] ?? 0);
		this.forget('beam.spans');
		this.forget('beam.bearing');
		this.#stretchFullLoads(before);
		this.schedule();
	}

	// A load entered over the whole beam keeps covering the whole beam when a span changes.
	#stretchFullLoads(before: number): void {
		const after = totalLength(this.case.beam);
		if (Math.abs(after - before) < 1e-12) return;
		this.case.loads.forEach((load, i) => {
			if (load.kind === 'point' || Math.abs(load.from) > 1e-9 || Math.abs(load.to - before) > 1e-9)
				return;
			load.to = after;
			delete this.texts[`loads[${i}].to`];
		});
	}

	addLoad(load: CaseLoad): void {
		this.update((c) => c.loads.push(load));
	}

	removeLoad(index: number): void {
		this.case.loads.splice(index, 1);
		this.texts = shiftListKeys(this.texts, 'loads', index);
		this.local = shiftListKeys(this.local, 'loads', index);
		this.schedule();
	}

	/** Replaces the whole case (opened, restored, shared link, demo) and runs it at once. */
	load(
		c: CaseFile,
		options: { savedId?: string | null; texts?: Record<string, string>; units?: UnitSystem } = {}
	): void {
		this.case = toSiCase(c);
		this.#heldLength = undefined;
		this.texts = {};
		this.local = {};
		this.savedId = options.savedId ?? null;
		// An opened case's grade counts as chosen only where it is not its section's usual one.
		this.gradeByHand = false;
		this.gradeNote = null;
		const typedIn = options.units ?? this.units;
		const current = this.units;
		this.units = typedIn;
		for (const [path, text] of Object.entries(options.texts ?? {})) {
			// Only numeric fields are re-read; a search text (designation) restarts from the case.
			const value = readPath(c, path);
			if (typeof value !== 'number' && !isBlank(value)) continue;
			this.texts[path] = text;
			const info = describeField(path, c);
			if (readBlankText(text, info).blank) continue;
			const parsed = parseFieldText(text, info, typedIn);
			if (!parsed.ok) this.local[path] = parsed.message;
		}
		this.#showIn(current);
		void this.runNow();
	}

	/**
	 * Switches display units: valid fields are re-shown from the SI case, which never changes, and
	 * a result already asked for is run again, since its words and share texts are in the units.
	 */
	setUnits(units: UnitSystem): void {
		if (units === this.units) return;
		this.#showIn(units);
		if (this.outcome !== null || this.pending) void this.runNow();
	}

	#showIn(units: UnitSystem): void {
		if (units === this.units) return;
		for (const key of Object.keys(this.texts)) if (!(key in this.local)) delete this.texts[key];
		this.units = units;
	}

	/** A plain copy for the draft store. */
	snapshot(): FormDraft {
		return {
			case: $state.snapshot(this.case) as CaseFile,
			texts: { ...this.texts },
			units: this.units,
			savedId: this.savedId
		};
	}

	/** Waits for a quiet moment, then runs the engine once (or clears the result while typing is wrong). */
	schedule(): void {
		clearTimeout(this.#timer);
		// Any answer still on its way is for an older case now.
		this.#seq += 1;
		this.#options.onchange?.(this.snapshot());
		if (Object.keys(this.local).length > 0) {
			this.outcome = null;
			this.pending = false;
			return;
		}
		this.pending = true;
		this.#timer = setTimeout(() => void this.runNow(), this.#options.delay ?? 200);
	}

	/** Runs the engine now; resolves when its answer (if still current) is in `outcome`. */
	async runNow(): Promise<void> {
		clearTimeout(this.#timer);
		const seq = ++this.#seq;
		this.pending = false;
		if (Object.keys(this.local).length > 0) {
			this.outcome = null;
			return;
		}
		let outcome: CheckOutcome;
		try {
			const answer = this.#options.run($state.snapshot(this.case) as CaseFile);
			if (answer === null) {
				this.pending = true;
				return;
			}
			this.pending = true;
			outcome = await answer;
		} catch (error) {
			// Whatever went wrong, the form shows it instead of waiting forever.
			outcome = { state: 'error', message: error instanceof Error ? error.message : String(error) };
		}
		// Only the answer to the latest case is shown.
		if (seq !== this.#seq) return;
		this.outcome = outcome;
		this.pending = false;
		if (outcome.state === 'report') void this.#addCurve(seq);
	}

	/** Replaces the shown report by the same check with its curve, if the case is still current. */
	async #addCurve(seq: number): Promise<void> {
		let more: CheckOutcome | null = null;
		try {
			more = await (this.#options.runCurve?.($state.snapshot(this.case) as CaseFile) ?? null);
		} catch {
			// The answer is already shown; a failed curve leaves it as it is.
			return;
		}
		if (seq === this.#seq && more?.state === 'report') this.outcome = more;
	}

	dispose(): void {
		clearTimeout(this.#timer);
	}
}
