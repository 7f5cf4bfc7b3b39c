/**
 * Share text is plain for any input: no character a messaging app renders as markup, and the
 * short form always fits a message (limit as specified for the summary).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isPlainText, toPlainText } from '../../src/lib/engine/report/plain-text';
import {
	SHORT_SUMMARY_LIMIT,
	writeLongSummary,
	writeShortSummary
} from '../../src/lib/engine/report/summary';

describe('plain text', () => {
	it('toPlainText leaves no markup character in any string', () => {
		fc.assert(
			fc.property(fc.string({ maxLength: 200 }), (s) => {
				expect(isPlainText(toPlainText(s))).toBe(true);
			})
		);
	});

	it('both summaries are plain and the short one fits, whatever the title, place and labels', () => {
		fc.assert(
			fc.property(
				fc.string({ maxLength: 300 }),
				fc.string({ maxLength: 100 }),
				fc.array(fc.string({ maxLength: 40 }), { maxLength: 12 }),
				(title, place, labels) => {
					const input = {
						title,
						place,
						date: '2 Dec 2026',
						spans: [6, 4],
						supports: ['pin', 'pin', 'pin'],
						section: 'UB 305x165x40',
						grade: 'S275',
						loads: labels.map((label, i) => ({
							action: 'temporary' as const,
							kind: 'point' as const,
							value: 10 + i,
							at: 1 + i / 10,
							label
						})),
						factorSet: 'EN 1990 6.10a/b',
						factors: { xi: 0.85 },
						verdict: 'fail' as const,
						routeReasons: ['Class 2 section'],
						governing: { label: 'Lateral-torsional buckling, segment 1', utilisation: 1.2 },
						reserve: -17,
						allowable: labels.map((label, i) => `8.3 kN (load ${i + 1}, ${label})`),
						checks: [],
						notice: 'Screening aid only.',
						notices: [],
						assumptions: []
					};
					const short = writeShortSummary(input);
					expect(short.length).toBeLessThan(SHORT_SUMMARY_LIMIT);
					// The engineer-of-record notice is never cut.
					expect(short.endsWith(input.notice)).toBe(true);
					expect(isPlainText(short)).toBe(true);
					expect(isPlainText(writeLongSummary(input))).toBe(true);
				}
			),
			{ numRuns: 60 }
		);
	});
});
