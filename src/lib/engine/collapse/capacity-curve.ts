/** Placeholder replaced below. */
import type { BeamLine, CapacitySegment, Load } from '../model/types';
import type { CapacityCurve } from './types';

/** Capacity curve (work in progress). */
export function computeCapacityCurve(options: { beam: BeamLine; capacity: CapacitySegment[]; fixedLoads: Load[] }): CapacityCurve {
	void options;
	return { status: 'unbounded', message: 'not yet implemented' };
}
