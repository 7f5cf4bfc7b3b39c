/**
 * Every sentence and name of a report in the units it is read in: notices, assumptions, route
 * reasons, check notes and labels, messages, section and grade names. The numbers stay in the
 * report's own output units (SI); only the words follow the reader's units.
 */
import { restateAll, restateSectionName, restateUnits } from './restate-units';
import type { SummaryUnits } from './summary-units';
import type { CheckReport } from './types';

/**
 * The report with its words in `units` (the same object, changed in place): figures written in
 * the other system are restated, figures already in `units` are left exactly as written.
 * The answer's message is written in its units from the start (see answer-report.ts), and grade
 * source tags stay as cited.
 */
export function restateReportWords(r: CheckReport, units: SummaryUnits): CheckReport {
	const say = (t: string) => restateUnits(t, units);
	const sayOrNull = (t: string | null) => (t === null ? null : say(t));
	r.answer.reasons = restateAll(r.answer.reasons, units);
	r.design.route.reasons = restateAll(r.design.route.reasons, units);
	r.design.warnings = restateAll(r.design.warnings, units);
	r.design.governingArrangement = sayOrNull(r.design.governingArrangement);
	for (const c of r.checks) {
		c.label = say(c.label);
		c.note = sayOrNull(c.note);
		c.arrangement = sayOrNull(c.arrangement);
	}
	if (r.answer.governing) r.answer.governing.label = say(r.answer.governing.label);
	if (r.collapse) {
		r.collapse.message = sayOrNull(r.collapse.message);
		r.collapse.arrangement = say(r.collapse.arrangement);
		if (r.collapse.mechanism) r.collapse.mechanism.name = say(r.collapse.mechanism.name);
	}
	if (r.designMoments) {
		r.designMoments.label = say(r.designMoments.label);
		r.designMoments.arrangement = say(r.designMoments.arrangement);
		for (const l of r.designMoments.limits) l.label = say(l.label);
	}
	if (r.capacityCurve) {
		r.capacityCurve.label = say(r.capacityCurve.label);
		for (const s of r.capacityCurve.stretches) s.governing.label = say(s.governing.label);
		if (r.capacityCurve.min?.governing) {
			r.capacityCurve.min.governing.label = say(r.capacityCurve.min.governing.label);
		}
	}
	r.effects.notAvailable = restateAll(r.effects.notAvailable, units);
	for (const s of r.sections) {
		s.designation = restateSectionName(s.designation, units);
		s.classNote = sayOrNull(s.classNote);
	}
	for (const g of r.grades) {
		if (!g) continue;
		g.name = say(g.name);
		g.note = sayOrNull(g.note);
	}
	r.notices = restateAll(r.notices, units);
	r.assumptions = restateAll(r.assumptions, units);
	return r;
}
