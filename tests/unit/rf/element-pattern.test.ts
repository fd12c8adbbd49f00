// Element pattern: symmetric cuts, the maximum at broadside, the models' grazing levels, values against the published formulas, directivity against the sizing's own closed forms, beamwidths.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	besselJ,
	circularRadiationConductanceS,
	elementCutDb,
	elementCutMagnitude,
	elementFieldMagnitude,
	elementHalfPowerBeamwidthDeg,
	elementPattern,
	elementPatternGeometry,
	integrateGaussLegendre,
	size,
	slotConductance,
	TM11_EIGENVALUE,
	type ElementPatternGeometry
} from '../../../src/lib/rf';
import { circularDirectivity, rectangularDirectivity } from '../../../src/lib/rf/performance-estimates';
import { sizeDocument } from '../../fixtures/designs/size-document';

const C_MM_PER_S = 299_792_458e3;

/** A two-slot geometry in free-space wavelengths at f. */
const slots = (f: number, wL: number, leffL: number, hL: number): ElementPatternGeometry => {
	const lambda = C_MM_PER_S / f;
	return { model: 'two-slot', frequencyHz: f, widthMm: wL * lambda, effectiveLengthMm: leffL * lambda, heightMm: hL * lambda };
};
/** A disc by k0·a_e at f. */
const disc = (f: number, ka: number): ElementPatternGeometry => ({ model: 'cavity-tm11', frequencyHz: f, effectiveRadiusMm: (ka * C_MM_PER_S) / f / (2 * Math.PI) });

// Ranges a sized patch reaches: W 0.2–0.6 λ0, Leff from λ0/(2√30) to λ0/2, h up to 0.05 λ0; a disc's k0·a_e = χ′11/√εeff < χ′11.
const twoSlotArb = fc
	.record({ f: fc.double({ min: 0.4e9, max: 20e9, noNaN: true }), w: fc.double({ min: 0.2, max: 0.6, noNaN: true }), leff: fc.double({ min: 0.092, max: 0.5, noNaN: true }), h: fc.double({ min: 0.0005, max: 0.05, noNaN: true }) })
	.map((r) => slots(r.f, r.w, r.leff, r.h));
const discArb = fc.record({ f: fc.double({ min: 0.4e9, max: 20e9, noNaN: true }), ka: fc.double({ min: 0.3, max: TM11_EIGENVALUE - 1e-6, noNaN: true }) }).map((r) => disc(r.f, r.ka));
const anyPatch = fc.oneof(twoSlotArb, discArb);
const angle = fc.double({ min: 0, max: 90, noNaN: true });
const plane = fc.constantFrom('e' as const, 'h' as const);

describe('element pattern: invariants of the models (fast-check)', () => {
	it('gives symmetric cuts: the same level at +θ and −θ in both planes (a symmetric patch)', () => {
		fc.assert(
			fc.property(anyPatch, plane, angle, (g, p, a) => {
				expect(elementCutMagnitude(g, p, -a)).toBeCloseTo(elementCutMagnitude(g, p, a), 12);
			}),
			{ numRuns: 200 }
		);
	});

	it('has its maximum at broadside (normalised 1 there, never above it) in both planes and off the planes', () => {
		fc.assert(
			fc.property(anyPatch, plane, angle, fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), (g, p, a, phi) => {
				expect(elementCutMagnitude(g, p, 0)).toBeCloseTo(1, 12);
				expect(elementCutMagnitude(g, p, a)).toBeLessThanOrEqual(1 + 1e-12);
				expect(elementFieldMagnitude(g, (a * Math.PI) / 180, phi)).toBeLessThanOrEqual(1 + 1e-12);
			}),
			{ numRuns: 300 }
		);
	});

	it('puts a null in the H-plane at grazing (θ = 90°) in both models: the cosθ factor of E_φ over an infinite ground', () => {
		fc.assert(
			fc.property(anyPatch, (g) => {
				expect(elementCutMagnitude(g, 'h', 90)).toBeLessThan(1e-12);
				expect(elementCutMagnitude(g, 'h', -90)).toBeLessThan(1e-12);
			}),
			{ numRuns: 100 }
		);
	});

	it('keeps the E-plane above zero at grazing: |cos(k0·Leff/2)|/sinc(k0h/2) for two slots, |J0 − J2|(k0·a_e) for the disc (these air models leave out the dielectric that would null it)', () => {
		fc.assert(
			fc.property(twoSlotArb, (g) => {
				if (g.model !== 'two-slot') return;
				const k0 = (2 * Math.PI * g.frequencyHz) / C_MM_PER_S;
				const a = (k0 * g.heightMm) / 2;
				const expected = Math.abs(Math.cos((k0 * g.effectiveLengthMm) / 2)) / (Math.sin(a) / a);
				expect(elementCutMagnitude(g, 'e', 90)).toBeCloseTo(expected, 10);
				expect(expected).toBeGreaterThan(0);
			}),
			{ numRuns: 100 }
		);
		fc.assert(
			fc.property(discArb, (g) => {
				if (g.model !== 'cavity-tm11') return;
				const x = (2 * Math.PI * g.frequencyHz * g.effectiveRadiusMm) / C_MM_PER_S;
				expect(elementCutMagnitude(g, 'e', 90)).toBeCloseTo(Math.abs(besselJ(0, x) - besselJ(2, x)), 10);
				expect(elementCutMagnitude(g, 'e', 90)).toBeGreaterThan(0);
			}),
			{ numRuns: 100 }
		);
	});
});

describe('element pattern: values against the published expressions', () => {
	// Balanis, Antenna Theory 4th ed., Example 14.1 (from memory): 10 GHz, εr 2.2, h 1.588 mm → W 11.86 mm, L 9.06 mm, ΔL 0.81 mm.
	const f = 10e9;
	const balanis: ElementPatternGeometry = { model: 'two-slot', frequencyHz: f, widthMm: 11.86, effectiveLengthMm: 9.06 + 2 * 0.81, heightMm: 1.588 };
	const k0 = (2 * Math.PI * f) / C_MM_PER_S;
	const sinc = (x: number) => Math.sin(x) / x;
	// Balanis §14.2.4 (from memory): E-plane sin(k0h/2·cosψ)/(k0h/2·cosψ)·cos(k0Leff/2·sinψ); H-plane cosψ·sinc(k0h/2·cosψ)·sinc(k0W/2·sinψ); ψ from broadside
	const balanisE = (deg: number) => {
		const p = (deg * Math.PI) / 180;
		return (sinc(((k0 * 1.588) / 2) * Math.cos(p)) * Math.cos(((k0 * 10.68) / 2) * Math.sin(p))) / sinc((k0 * 1.588) / 2);
	};
	const balanisH = (deg: number) => {
		const p = (deg * Math.PI) / 180;
		return (Math.cos(p) * sinc(((k0 * 1.588) / 2) * Math.cos(p)) * sinc(((k0 * 11.86) / 2) * Math.sin(p))) / sinc((k0 * 1.588) / 2);
	};
	it.each([15, 30, 45, 60, 75, 89])('gives the two-slot E- and H-plane levels of Balanis Example 14.1’s patch at %i°', (deg) => {
		expect(elementCutMagnitude(balanis, 'e', deg)).toBeCloseTo(balanisE(deg), 12);
		expect(elementCutMagnitude(balanis, 'h', deg)).toBeCloseTo(balanisH(deg), 12);
		expect(elementCutDb(balanis, 'e', -deg)).toBeCloseTo(20 * Math.log10(balanisE(deg)), 9);
	});

	// Balanis §14.3 (from memory): E-plane ∝ J0(x) − J2(x) = 2·J1′(x), H-plane ∝ cosθ·(J0(x) + J2(x)) = cosθ·2·J1(x)/x, x = k0·a_e·sinθ.
	// Written here with J1′ = J0 − J1/x and the recurrence, not the J2 the code uses.
	const ring = disc(1.57542e9, TM11_EIGENVALUE / Math.sqrt(2.2));
	it.each([10, 30, 50, 70, 90])('gives the TM11 disc’s E- and H-plane levels from J1′ and J1/x at %i°', (deg) => {
		const t = (deg * Math.PI) / 180;
		const x = (TM11_EIGENVALUE / Math.sqrt(2.2)) * Math.sin(t);
		const j1Prime = besselJ(0, x) - besselJ(1, x) / x;
		expect(elementCutMagnitude(ring, 'e', deg)).toBeCloseTo(Math.abs(2 * j1Prime), 10);
		expect(elementCutMagnitude(ring, 'h', deg)).toBeCloseTo(Math.abs((Math.cos(t) * 2 * besselJ(1, x)) / x), 10);
	});

	/** 4π·U(broadside) / ∫ U dΩ over the half space above the ground, by Gauss–Legendre quadrature. */
	function numericDirectivity(g: ElementPatternGeometry): number {
		const inner = (theta: number) => integrateGaussLegendre((phi) => elementFieldMagnitude(g, theta, phi) ** 2, 0, 2 * Math.PI, 24) * Math.sin(theta);
		return (4 * Math.PI) / integrateGaussLegendre(inner, 0, Math.PI / 2, 24);
	}

	it('integrates to the two-slot directivity the sizing uses (Balanis §14.2.4 with G1, G12; from memory) for a thin patch', () => {
		// h → 0: the closed form leaves out the slot height; the slot separation is the same Leff in both
		for (const [wL, sL] of [
			[0.39, 0.33],
			[0.5, 0.45],
			[0.3, 0.2]
		]) {
			const g = slots(5e9, wL, sL, 1e-5);
			if (g.model !== 'two-slot') throw new Error('two-slot expected');
			const pair = slotConductance({ widthMm: g.widthMm, lengthMm: g.effectiveLengthMm, frequencyHz: g.frequencyHz });
			const closed = rectangularDirectivity(g.widthMm, g.frequencyHz, pair.slotIntegral, pair.slotConductanceS, pair.mutualConductanceS);
			expect(numericDirectivity(g) / closed).toBeCloseTo(1, 3);
		}
	});

	it('integrates to the disc directivity the sizing uses, (k0·a_e)²/(120·G_rad) (Balanis §14.3; from memory)', () => {
		for (const er of [2.2, 4.4, 10.2]) {
			const g = disc(2.45e9, TM11_EIGENVALUE / Math.sqrt(er));
			if (g.model !== 'cavity-tm11') throw new Error('disc expected');
			const closed = circularDirectivity(g.effectiveRadiusMm, g.frequencyHz, circularRadiationConductanceS(g.effectiveRadiusMm, g.frequencyHz));
			expect(numericDirectivity(g) / closed).toBeCloseTo(1, 3);
		}
	});
});

describe('element pattern: half-power beamwidths', () => {
	it('finds the E-plane −3 dB width of a thin two-slot patch at 2·asin(λ0/(4·Leff)) (the model solved by hand for h → 0)', () => {
		for (const leff of [0.3, 0.36, 0.45]) {
			const g = slots(2.45e9, 0.4, leff, 1e-6);
			expect(elementHalfPowerBeamwidthDeg(g, 'e')).toBeCloseTo((2 * Math.asin(1 / (4 * leff)) * 180) / Math.PI, 4);
		}
	});

	it('gives no E-plane −3 dB width when the slots are too close for the cut to fall 3 dB by grazing (Leff < λ0/4: cos(k0·Leff/2) > 1/√2)', () => {
		expect(elementHalfPowerBeamwidthDeg(slots(2.45e9, 0.3, 0.2, 0.005), 'e')).toBeNull();
	});

	it('puts a sized 2.45 GHz patch’s beamwidths in the typical 60°–110° of a single patch (common practice, from memory), H-plane narrower than E-plane on low εr', () => {
		const sized = sizeDocument({ frequencyHz: 2.45e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 2.2, heightMm: 1.575, lossTangent: 0.0009 } });
		const p = elementPattern(elementPatternGeometry(sized)!);
		expect(p.halfPowerBeamwidthHDeg!).toBeGreaterThan(60);
		expect(p.halfPowerBeamwidthHDeg!).toBeLessThan(110);
		expect(p.halfPowerBeamwidthEDeg!).toBeGreaterThan(60);
		expect(p.halfPowerBeamwidthEDeg!).toBeLessThan(110);
		expect(p.halfPowerBeamwidthHDeg!).toBeLessThan(p.halfPowerBeamwidthEDeg!);
	});

	it('makes the H-plane of a disc on εr 2.2 narrower than its E-plane, with both cuts 0 dB at broadside and the H-plane at the −80 dB floor at grazing', () => {
		const sized = sizeDocument({ frequencyHz: 1.57542e9, shape: 'circular', feed: 'probe', substrate: { relativePermittivity: 2.2, heightMm: 1.575, lossTangent: 0.0009 } });
		const p = elementPattern(elementPatternGeometry(sized)!);
		expect(p.eDb[90]).toBe(0);
		expect(p.hDb[90]).toBe(0);
		expect(p.grazingHDb).toBe(-80);
		expect(p.halfPowerBeamwidthHDeg!).toBeLessThan(p.halfPowerBeamwidthEDeg ?? 180);
	});
});

describe('element pattern of a sized design', () => {
	it('uses the patch width, L + 2ΔL and the substrate height for the rectangular family, and the effective radius for a disc', () => {
		const rect = sizeDocument({ frequencyHz: 5.8e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 2.2, heightMm: 0.787, lossTangent: 0.0009 } });
		const g = elementPatternGeometry(rect)!;
		expect(g).toMatchObject({ model: 'two-slot', heightMm: 0.787 });
		if (g.model !== 'two-slot' || rect.patch.kind !== 'rectangular') throw new Error('two-slot expected');
		expect(g.widthMm).toBeCloseTo(rect.patch.widthMm, 9);
		expect(g.effectiveLengthMm).toBeCloseTo(rect.effectiveLengthMm!, 9);
		const cp = sizeDocument({ frequencyHz: 5.8e9, shape: 'truncated-corner', feed: 'inset', substrate: { relativePermittivity: 2.2, heightMm: 0.787, lossTangent: 0.001 } });
		const gc = elementPatternGeometry(cp)!;
		if (gc.model !== 'two-slot' || cp.patch.kind !== 'truncated-corner') throw new Error('two-slot expected');
		expect(gc.widthMm).toBeCloseTo(cp.patch.sideMm, 9);
		const round = sizeDocument({ frequencyHz: 5.2e9, shape: 'circular', feed: 'probe', substrate: { relativePermittivity: 2.2, heightMm: 0.787, lossTangent: 0.001 } });
		expect(elementPatternGeometry(round)).toMatchObject({ model: 'cavity-tm11', effectiveRadiusMm: round.patch.kind === 'circular' ? round.patch.effectiveRadiusMm : NaN });
	});

	it('gives no element pattern for an array (its page shows the array factor)', () => {
		const arr = sizeDocument({ frequencyHz: 5.8e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 2.2, heightMm: 0.787, lossTangent: 0.0009 }, array: { columns: 4 } });
		expect(elementPatternGeometry(arr)).toBeNull();
	});
});
