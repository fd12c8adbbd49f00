// The resolved stack of a document (top to bottom) and its dielectric groups: the layers between two coppers acting as one.
import { laminateClassFor, type DesignInput } from '../schemas';
import { mmFromUm } from '../units';
import type { SizedStackEntry } from './sized-design';

/** The dielectrics between two neighbouring coppers, as one equivalent layer. */
export interface DielectricGroup {
	heightMm: number;
	/** Series (layered capacitor) permittivity Σh / Σ(h/εr): exact for a field normal to the layers (common practice, no source). */
	relativePermittivity: number;
	/** Loss tangent weighted by each layer's share of the stored energy, h·tanδ/εr over h/εr (common practice, no source). */
	lossTangent: number;
}

export interface ResolvedStack {
	entries: SizedStackEntry[];
	/** groups[i] lies between copper i+1 and copper i+2 (1 = top). */
	groups: DielectricGroup[];
}

export function resolveLayerStack(d: DesignInput): ResolvedStack {
	const s = d.substrate;
	const copper = (thicknessUm?: number): SizedStackEntry => ({ kind: 'copper', thicknessMm: mmFromUm(thicknessUm ?? s.copperThicknessUm), conductivitySPerM: s.copperConductivitySPerM });
	const entries: SizedStackEntry[] = d.stack
		? d.stack.map((l) =>
				l.kind === 'copper' ? copper(l.thicknessUm) : { kind: 'dielectric', heightMm: l.heightMm, relativePermittivity: l.relativePermittivity, lossTangent: l.lossTangent, bonding: l.bonding }
			)
		: [copper(), { kind: 'dielectric', heightMm: s.heightMm, relativePermittivity: s.relativePermittivity, lossTangent: s.lossTangent ?? laminateClassFor(s.relativePermittivity).typicalLossTangent, bonding: false }, copper()];
	const groups: DielectricGroup[] = [];
	let run: Extract<SizedStackEntry, { kind: 'dielectric' }>[] = [];
	for (const e of entries) {
		if (e.kind === 'dielectric') run.push(e);
		else if (run.length) {
			groups.push(combineDielectrics(run));
			run = [];
		}
	}
	return { entries, groups };
}

export function combineDielectrics(layers: readonly { heightMm: number; relativePermittivity: number; lossTangent: number }[]): DielectricGroup {
	const h = layers.reduce((a, l) => a + l.heightMm, 0);
	const hOverEr = layers.reduce((a, l) => a + l.heightMm / l.relativePermittivity, 0);
	const loss = layers.reduce((a, l) => a + (l.heightMm * l.lossTangent) / l.relativePermittivity, 0);
	return { heightMm: h, relativePermittivity: h / hOverEr, lossTangent: loss / hOverEr };
}
