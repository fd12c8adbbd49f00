// Radiating-slot conductances of a rectangular patch, G1 and G12, by numeric integration; the edge resistance from them.
import { FREE_SPACE_IMPEDANCE_OHM, freeSpaceWavelengthMm } from '../units';
import { besselJ } from './bessel';
import { integrateGaussLegendre } from './gauss-legendre';
import { requireObject, requirePositive } from './guard';

export interface SlotPair {
	/** Slot length = patch width W. */
	widthMm: number;
	/** Slot separation = patch length L. */
	lengthMm: number;
	frequencyHz: number;
}

export interface SlotConductances {
	/** Self conductance of one radiating slot G1. */
	slotConductanceS: number;
	/** Mutual conductance between the two slots G12. */
	mutualConductanceS: number;
	/** Rin = 1/(2(G1 + G12)) at the radiating edge (odd-mode TM010 field). */
	edgeResistanceOhm: number;
	/** I1 = ∫0^π [sin(k0W/2·cosθ)/cosθ]² sin³θ dθ, reused by the directivity estimate. */
	slotIntegral: number;
}

/** [sin(x·cosθ)/cosθ]²·sin³θ, with its limit x²·1 at θ = π/2. */
function slotPattern(x: number, theta: number): number {
	const c = Math.cos(theta);
	const s = Math.sin(theta);
	const ratio = Math.abs(c) < 1e-12 ? x : Math.sin(x * c) / c;
	return ratio * ratio * s * s * s;
}

/**
 * G1 = I1/(120π²) and G12 = 1/(120π²)·∫0^π [sin(k0W/2·cosθ)/cosθ]² J0(k0L·sinθ) sin³θ dθ
 * (Balanis, Antenna Theory, §14.2.1, from memory; 120π is written as η0). The integrands are
 * symmetric about θ = π/2, so [0, π/2] is integrated and doubled.
 */
export function slotConductance(pair: SlotPair): SlotConductances {
	const p = requireObject('pair', pair);
	const widthMm = requirePositive('widthMm', p.widthMm);
	const lengthMm = requirePositive('lengthMm', p.lengthMm);
	const frequencyHz = requirePositive('frequencyHz', p.frequencyHz);
	const k0 = (2 * Math.PI) / freeSpaceWavelengthMm(frequencyHz);
	const x = (k0 * widthMm) / 2;
	const kl = k0 * lengthMm;
	const panels = 1 + Math.floor(Math.max(x, kl) / 3);
	const i1 = 2 * integrateGaussLegendre((t) => slotPattern(x, t), 0, Math.PI / 2, panels);
	const i12 = 2 * integrateGaussLegendre((t) => slotPattern(x, t) * besselJ(0, kl * Math.sin(t)), 0, Math.PI / 2, panels);
	const scale = 1 / (Math.PI * FREE_SPACE_IMPEDANCE_OHM);
	const g1 = i1 * scale;
	const g12 = i12 * scale;
	return { slotConductanceS: g1, mutualConductanceS: g12, edgeResistanceOhm: 1 / (2 * (g1 + g12)), slotIntegral: i1 };
}
