import { NO_VALUE } from './format-quantity';

/**
 * Formats a utilisation ratio (demand / resistance) as a percentage. Whole percent normally; a
 * ratio just above 1 that would round to 100 % is shown with one decimal, so a failing check
 * never reads like a pass.
 * @example
 * formatUtilisation(0.873) // '87%'
 * formatUtilisation(1.004) // '100.4%'
 */
export function formatUtilisation(u: number): string {
	if (!Number.isFinite(u)) return NO_VALUE;
	const percent = u * 100;
	const whole = Math.round(percent);
	// Rounded up, never down: binary noise may add 0.1, which errs on the safe side.
	if (u > 1 && whole <= 100) return `${(Math.ceil(percent * 10) / 10).toFixed(1)}%`;
	return `${whole === 0 ? 0 : whole}%`;
}
