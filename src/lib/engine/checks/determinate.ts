/**
 * The statically determinate release of a beam line: interior joints become hinges and fixed
 * ends become pins, except where a cantilever needs them to stand. Its moments are the free
 * moments of each span (and the cantilever moments) used to move a collapse field from the
 * collapse load back to the design load.
 */
import type { BeamLine } from '../model/types';

/**
 * Releases the redundants of a beam line.
 * @example
 * const beam = { spans: [6000, 6000], supports: ['pin', 'pin', 'pin'], joints: ['continuous'] };
 * releaseRedundants(beam).joints // ['simple']
 */
export function releaseRedundants(beam: BeamLine): BeamLine {
	const n = beam.spans.length;
	const s = beam.supports;
	// A span is a cantilever when one of its end nodes is free.
	const cantilever = beam.spans.map((_, i) => s[i] === 'free' || s[i + 1] === 'free');
	const supports = s.map((kind, node) => {
		if (kind !== 'fixed') return kind;
		const left = node > 0 && cantilever[node - 1];
		const right = node < n && cantilever[node];
		return left || right ? kind : 'pin';
	});
	const joints = beam.joints.map((kind, j) => {
		const node = j + 1;
		return cantilever[node - 1] || cantilever[node] ? kind : 'simple';
	});
	return { spans: beam.spans, supports, joints };
}
