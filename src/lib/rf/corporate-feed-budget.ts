// The corporate feed's routed path from the port to one element, its line loss and the mismatch the port sees: the array-gain budget.
import { dbFromPowerRatio, mmFromM, SPEED_OF_LIGHT_M_PER_S } from '../units';
import { lineLossDbPerMm } from './microstrip-loss';
import type { SizedLine } from './sized-design';

/** What the path needs to know of the array and its element (all lengths in mm). */
export interface FeedPathInput {
	columns: number;
	rows: number;
	spacingXMm: number;
	spacingYMm: number;
	/** The Z0 line, the λg/4 transformer in each arm, the step between tree levels and the clearance (SizedCorporateFeed). */
	line: SizedLine;
	transformer: SizedLine;
	levelPitchMm: number;
	clearanceMm: number;
	/** Ground margin: the port line's run past the lowest network copper to the board edge. */
	marginMm: number;
	/** How far the element's feed-layer copper reaches left of its feed point (several rows: the column of trees runs left of it). */
	elementLeftReachMm: number;
	/** Z0 line from the element's feed point into the element (to the inset point, the patch edge, or the coupling point). */
	elementLeadMm: number;
}

/** One level of the path, from the element towards the port: a Z0 run, then (except the trunk) a λg/4 transformer into a T-junction. */
export interface FeedPathLevel {
	/** Z0 line before the transformer (drops, connectors and the arm's own Z0 part). */
	lineMm: number;
	/** True for the levels that end in a transformer and a T-junction; false for the trunk to the port. */
	junction: boolean;
}

/**
 * The routed path from element (0, 0) to the port, level by level, as `layoutCorporateFeed`
 * (artwork/build-corporate-feed.ts) draws it: every element's path has the same length. Rows: a
 * tree per row with horizontal arms of 2^(k−1)·dx and a drop of one level pitch before every level
 * after the first; several rows: the row's root drops one pitch and runs left past every element to a
 * column of trees with vertical arms of 2^(j−1)·dy, stepping left one pitch per level; the trunk
 * runs to the board edge a margin below the lowest copper.
 */
export function corporateFeedPath(p: FeedPathInput): FeedPathLevel[] {
	const P = p.levelPitchMm;
	const qt = p.transformer.lengthMm;
	const w = p.line.widthMm;
	const lc = Math.round(Math.log2(p.columns));
	const lr = Math.round(Math.log2(p.rows));
	const levels: FeedPathLevel[] = [];
	let carry = p.elementLeadMm;
	for (let k = 0; k < lc; k++) {
		levels.push({ lineMm: carry + (k > 0 ? P : 0) + 2 ** (k - 1) * p.spacingXMm - qt, junction: true });
		carry = 0;
	}
	if (p.rows === 1) {
		levels.push({ lineMm: carry + P + p.marginMm, junction: false });
		return levels;
	}
	// the row's root: one pitch down, then left to the column of trees left of every element
	carry += P + ((p.columns - 1) * p.spacingXMm) / 2 + p.elementLeftReachMm + p.clearanceMm + w / 2;
	for (let j = 0; j < lr; j++) {
		levels.push({ lineMm: carry + (j > 0 ? P : 0) + 2 ** (j - 1) * p.spacingYMm - qt, junction: true });
		carry = 0;
	}
	// one pitch left, then down past the lowest row connector to the board edge
	levels.push({ lineMm: P + ((p.rows - 1) * p.spacingYMm) / 2 + w / 2 + p.marginMm, junction: false });
	return levels;
}

/** Total routed length of a path: its Z0 line and its transformers. */
export function feedPathLengthMm(levels: readonly FeedPathLevel[], transformerLengthMm: number): { lineMm: number; transformerMm: number } {
	return levels.reduce((t, l) => ({ lineMm: t.lineMm + l.lineMm, transformerMm: t.transformerMm + (l.junction ? transformerLengthMm : 0) }), { lineMm: 0, transformerMm: 0 });
}

/** The dielectric and copper the lines run on. */
export interface FeedLineMedium {
	frequencyHz: number;
	relativePermittivity: number;
	lossTangent: number;
	conductivitySPerM: number;
}

/**
 * Line loss of the network in dB: the loss along one port-to-element path. Every path is alike, so
 * each element receives P_in/N·10^(−loss/10): the path loss is the network's loss.
 */
export function feedLineLossDb(levels: readonly FeedPathLevel[], line: SizedLine, transformer: SizedLine, m: FeedLineMedium): number {
	const { lineMm, transformerMm } = feedPathLengthMm(levels, transformer.lengthMm);
	const per = (l: SizedLine) => lineLossDbPerMm(l, m.frequencyHz, m.relativePermittivity, m.lossTangent, m.conductivitySPerM);
	return lineMm * per(line) + transformerMm * per(transformer);
}

type Complex = readonly [re: number, im: number];
const div = (a: Complex, b: Complex): Complex => {
	const d = b[0] * b[0] + b[1] * b[1];
	return [(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d];
};

/** Input impedance of a lossless line of Z0 and electrical length βl loaded by z (Pozar, Microwave Engineering 4th ed., eq. 2.44). */
function throughLine(z: Complex, z0: number, betaL: number): Complex {
	const t = Math.tan(betaL);
	return div([z0 * z[0], z0 * (z[1] + z0 * t)], [z0 - z[1] * t, z[0] * t]);
}

/**
 * Mismatch loss −10·log10(1 − |Γ|²) at the port at f0: each element's feed-point resistance carried
 * through the routed Z0 runs (lossless, their own εeff), the λg/4 transformers (Zt²/Z) and the
 * T-junctions (two equal arms in parallel), then compared with the port's Z0. Zero when the elements
 * present Z0 and the transformers are √2·Z0. The junctions' own reactance is not modelled.
 */
export function feedMismatchLossDb(levels: readonly FeedPathLevel[], elementResistanceOhm: number, line: SizedLine, transformer: SizedLine, portImpedanceOhm: number, frequencyHz: number): number {
	const betaPerMm = (2 * Math.PI * frequencyHz * Math.sqrt(line.effectivePermittivity)) / mmFromM(SPEED_OF_LIGHT_M_PER_S);
	let z: Complex = [elementResistanceOhm, 0];
	for (const level of levels) {
		z = throughLine(z, line.impedanceOhm, betaPerMm * level.lineMm);
		if (level.junction) {
			z = div([transformer.impedanceOhm ** 2, 0], z);
			z = [z[0] / 2, z[1] / 2];
		}
	}
	const g = div([z[0] - portImpedanceOhm, z[1]], [z[0] + portImpedanceOhm, z[1]]);
	const reflected = g[0] * g[0] + g[1] * g[1];
	return -dbFromPowerRatio(1 - Math.min(reflected, 1 - 1e-12));
}
