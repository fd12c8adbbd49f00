// Bessel functions of the first kind Jn(x) for the cavity and mutual-conductance integrals.

/** Below this |x| the power series is used; above it, Hankel's asymptotic expansion. */
const SERIES_LIMIT = 12;

function series(n: number, x: number): number {
	const half = x / 2;
	let term = 1;
	for (let k = 1; k <= n; k++) term *= half / k;
	let sum = term;
	const q = -half * half;
	for (let k = 1; k < 200; k++) {
		term *= q / (k * (k + n));
		sum += term;
		if (Math.abs(term) <= 1e-17 * Math.abs(sum)) break;
	}
	return sum;
}

function asymptotic(n: number, x: number): number {
	const mu = 4 * n * n;
	const z = 8 * x;
	let p = 1;
	let q = 0;
	let term = 1;
	// Terms alternate between P and Q: a_k = Π (mu - (2j-1)^2) / (k! z^k).
	for (let k = 1; k <= 12; k++) {
		term *= (mu - (2 * k - 1) ** 2) / (k * z);
		const sign = Math.floor(k / 2) % 2 === 0 ? 1 : -1;
		if (k % 2 === 1) q += sign * term;
		else p += sign * term;
	}
	const chi = x - (n / 2 + 0.25) * Math.PI;
	return Math.sqrt(2 / (Math.PI * x)) * (p * Math.cos(chi) - q * Math.sin(chi));
}

/** Jn(x) for integer order n ≥ 0 and finite x (accurate to about 1e-10 relative near the zeros). */
export function besselJ(n: number, x: number): number {
	const ax = Math.abs(x);
	const value = ax < SERIES_LIMIT ? series(n, ax) : asymptotic(n, ax);
	return x < 0 && n % 2 === 1 ? -value : value;
}

/** First zero of J1′: the TM11 eigenvalue χ′11 of a circular cavity (Abramowitz & Stegun table 9.5). */
export const TM11_EIGENVALUE = 1.841183781340659;
