/**
 * Brent's method for the minimum of a function of one variable on a bracket: golden-section
 * steps made safe, parabolic steps where the function is smooth (superlinear near a smooth
 * minimum, still convergent at a kink).
 */

const GOLDEN = 0.3819660112501051;

/** Minimum of f on [a, b] to an absolute tolerance tol in x. */
export function minimiseOnInterval(
	f: (x: number) => number,
	a: number,
	b: number,
	tol: number
): { x: number; f: number } {
	let x = a + GOLDEN * (b - a);
	let w = x;
	let v = x;
	let fx = f(x);
	let fw = fx;
	let fv = fx;
	let d = 0;
	let e = 0;
	for (let iter = 0; iter < 200; iter++) {
		const m = (a + b) / 2;
		const tol1 = tol + 1e-15 * Math.abs(x);
		if (Math.abs(x - m) <= 2 * tol1 - (b - a) / 2) break;
		let useGolden = true;
		if (Math.abs(e) > tol1) {
			const r = (x - w) * (fx - fv);
			let q = (x - v) * (fx - fw);
			let p = (x - v) * q - (x - w) * r;
			q = 2 * (q - r);
			if (q > 0) p = -p;
			q = Math.abs(q);
			if (Math.abs(p) < Math.abs(0.5 * q * e) && p > q * (a - x) && p < q * (b - x)) {
				e = d;
				d = p / q;
				const u = x + d;
				if (u - a < 2 * tol1 || b - u < 2 * tol1) d = x < m ? tol1 : -tol1;
				useGolden = false;
			}
		}
		if (useGolden) {
			e = (x < m ? b : a) - x;
			d = GOLDEN * e;
		}
		const u = Math.abs(d) >= tol1 ? x + d : x + (d > 0 ? tol1 : -tol1);
		const fu = f(u);
		if (fu <= fx) {
			if (u < x) b = x;
			else a = x;
			[v, fv, w, fw, x, fx] = [w, fw, x, fx, u, fu];
		} else {
			if (u < x) a = u;
			else b = u;
			if (fu <= fw || w === x) {
				[v, fv, w, fw] = [w, fw, u, fu];
			} else if (fu <= fv || v === x || v === w) {
				v = u;
				fv = fu;
			}
		}
	}
	return { x, f: fx };
}
