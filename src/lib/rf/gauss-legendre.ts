// Composite Gauss–Legendre quadrature: the numeric integration behind the slot and cavity conductances.

/** Nodes and weights of the n-point Gauss–Legendre rule on [-1, 1], by Newton iteration on Pn. */
function legendreRule(n: number): { nodes: Float64Array; weights: Float64Array } {
	const nodes = new Float64Array(n);
	const weights = new Float64Array(n);
	for (let i = 0; i < Math.ceil(n / 2); i++) {
		let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
		let dp = 0;
		for (let iter = 0; iter < 100; iter++) {
			let p0 = 1;
			let p1 = x;
			for (let k = 2; k <= n; k++) {
				const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
				p0 = p1;
				p1 = p2;
			}
			dp = (n * (x * p1 - p0)) / (x * x - 1);
			const step = p1 / dp;
			x -= step;
			if (Math.abs(step) < 1e-16) break;
		}
		const w = 2 / ((1 - x * x) * dp * dp);
		nodes[i] = -x;
		nodes[n - 1 - i] = x;
		weights[i] = w;
		weights[n - 1 - i] = w;
	}
	return { nodes, weights };
}

/** Points per panel; a 24-point rule integrates a smooth integrand over one panel to double precision. */
const POINTS_PER_PANEL = 24;
const RULE = legendreRule(POINTS_PER_PANEL);

/**
 * ∫ₐᵇ f(x) dx with `panels` equal panels of a 24-point Gauss–Legendre rule each. Use more panels
 * for an oscillating integrand (about one per three radians of phase).
 */
export function integrateGaussLegendre(f: (x: number) => number, a: number, b: number, panels = 1): number {
	const n = Math.max(1, Math.floor(panels));
	const step = (b - a) / n;
	let total = 0;
	for (let p = 0; p < n; p++) {
		const mid = a + (p + 0.5) * step;
		const half = step / 2;
		let sum = 0;
		for (let i = 0; i < POINTS_PER_PANEL; i++) sum += RULE.weights[i] * f(mid + half * RULE.nodes[i]);
		total += sum * half;
	}
	return total;
}
