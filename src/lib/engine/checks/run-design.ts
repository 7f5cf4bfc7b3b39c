/**
 * The one design run of a case: every number any surface reports (screen, command line, JSON,
 * share text) comes from here. The report only converts units and writes words, so no second
 * pipeline can answer the same question differently.
 */
import type { CaseModel } from '../case/types';
import { validateCollapseProblem } from '../collapse/index';
import type { InputIssue } from '../model/issue';
import { buildCapacity } from './capacity';
import type { DesignBasis } from './design-basis';
import type { FactorSettings } from './basis-types';
import { DEFAULT_BASIS } from './bases';
import { buildDesignCheckInput } from './from-case';
import { computeGoverningCurve, type GoverningCurve } from './governing-curve';
import type { DesignCheckInput, DesignCheckOutcome } from './inputs';
import { runDesignChecks } from './run-checks';
import { decideAnswer, type Answer } from './answer';

/** A span's section class (EN 1993-1-1 Table 5.2) and any note on how it was found. */
export interface SectionClassReading {
	class: 1 | 2 | 3 | 4 | null;
	note?: string;
}

/** Everything the report of a case shows, internal units. */
export interface DesignOutcome {
	input: DesignCheckInput;
	/** Class per span, with that span's fy (235 MPa where no grade is given). */
	sectionClasses: SectionClassReading[];
	checked: DesignCheckOutcome;
	answer: Answer;
	/** The governing capacity curve, when asked for and the beam is in scope. */
	curve: GoverningCurve | null;
}

/** Options of {@link runDesign}. */
export interface DesignOptions {
	/** Also compute the governing capacity curve (one design run per position). */
	curve?: boolean;
	basis?: DesignBasis<FactorSettings>;
}

/**
 * Runs the design checks of a validated case and decides the answer.
 * @example
 * const out = runDesign(model);
 * out.ok && out.value.answer.multiplier // the largest factor every deciding check allows
 */
export function runDesign(
	model: CaseModel,
	options: DesignOptions = {}
): { ok: true; value: DesignOutcome } | { ok: false; issues: InputIssue[] } {
	const basis = options.basis ?? DEFAULT_BASIS;
	const input = buildDesignCheckInput(model);
	const refused = validateCollapseProblem({
		beam: input.beam,
		capacity: buildCapacity(input.beam.spans, input.beam.spans.map(() => 1)),
		fixedLoads: input.loads.filter((l) => l.action !== 'temporary'),
		variableLoads: input.loads.filter((l) => l.action === 'temporary')
	}).filter((i) => i.severity === 'error');
	if (refused.length > 0) return { ok: false, issues: refused };
	const run = (i: DesignCheckInput) => runDesignChecks(i, basis);
	const checked = run(input);
	const answer = decideAnswer(checked, model.loads);
	const inScope = checked.verdict.verdict !== 'outside-scope';
	const curve = options.curve && inScope ? computeGoverningCurve(input, run) : null;
	const sectionClasses = model.sections.map((sec, e) =>
		basis.classifySection(sec, model.grades[e]?.fy ?? 235)
	);
	return { ok: true, value: { input, sectionClasses, checked, answer, curve } };
}
