import type { CaseFile, JointChoice, SupportChoice } from './case-file';

/** The support arrangements offered as plain choices on the form. */
export type BeamLayout =
	'simple' | 'fixed-both' | 'fixed-one' | 'cantilever' | 'overhang' | 'continuous';

/** Label and one-line explanation of each arrangement, in the order shown. */
export const BEAM_LAYOUTS: readonly { id: BeamLayout; label: string; hint: string }[] = [
	{ id: 'simple', label: 'Simply supported', hint: 'Rests on a support at each end' },
	{ id: 'fixed-both', label: 'Both ends fixed', hint: 'Built in at both ends' },
	{ id: 'fixed-one', label: 'One end fixed', hint: 'Built in at the left, resting at the right' },
	{ id: 'cantilever', label: 'Cantilever', hint: 'Built in at the left, free at the right' },
	{ id: 'overhang', label: 'With overhang', hint: 'Two supports, then a free end' },
	{ id: 'continuous', label: 'Continuous', hint: '2 to 5 spans over intermediate supports' }
];

/**
 * Which arrangement a beam line is, read from its supports.
 * @example
 * detectLayout({ spans: [6], supports: ['pin', 'pin'] }) // 'simple'
 */
export function detectLayout(beam: Pick<CaseFile['beam'], 'spans' | 'supports'>): BeamLayout {
	const key = beam.supports.join('-');
	if (key === 'pin-pin') return 'simple';
	if (key === 'fixed-fixed') return 'fixed-both';
	if (key === 'fixed-pin' || key === 'pin-fixed') return 'fixed-one';
	if (key === 'fixed-free') return 'cantilever';
	if (key === 'pin-pin-free') return 'overhang';
	return 'continuous';
}

/**
 * The spans, supports and joints of an arrangement, keeping the existing span lengths (m) where
 * they fit. Continuous beams take `spanCount` spans (2–5) on simple supports.
 * @example
 * applyLayout({ spans: [6], … }, 'overhang').spans // [6, 1.5]
 */
export function applyLayout(
	beam: Pick<CaseFile['beam'], 'spans' | 'supports' | 'joints'>,
	layout: BeamLayout,
	spanCount = 2
): { spans: number[]; supports: SupportChoice[]; joints: JointChoice[] } {
	const first = beam.spans[0] ?? 6;
	const single = (supports: SupportChoice[]) => ({ spans: [first], supports, joints: [] });
	if (layout === 'simple') return single(['pin', 'pin']);
	if (layout === 'fixed-both') return single(['fixed', 'fixed']);
	if (layout === 'fixed-one') return single(['fixed', 'pin']);
	if (layout === 'cantilever') return single(['fixed', 'free']);
	if (layout === 'overhang') {
		return {
			spans: [first, beam.spans[1] ?? 1.5],
			supports: ['pin', 'pin', 'free'],
			joints: ['continuous']
		};
	}
	const count = Math.min(5, Math.max(2, Math.round(spanCount)));
	const spans = Array.from({ length: count }, (_, i) => beam.spans[i] ?? first);
	const joints = Array.from(
		{ length: count - 1 },
		(_, i): JointChoice => beam.joints?.[i] ?? 'continuous'
	);
	return { spans, supports: Array(count + 1).fill('pin'), joints };
}

/**
 * Total length of the beam line, m.
 * @example
 * totalLength({ spans: [4, 1.5] }) // 5.5
 */
export function totalLength(beam: Pick<CaseFile['beam'], 'spans'>): number {
	return beam.spans.reduce((sum, span) => sum + span, 0);
}
