// Fab notes: fills the plain-text template from templates/ with the artwork's stack, drills and cautions.
// Text from users (design name, profile name, waiver reason) goes in on one line with control characters
// removed, and quoted inside our own sentences, so it can never forge a line of the notes.
import { fabNotesTemplate } from '../../../../templates/fab-notes';
import type { Artwork } from '../../artwork';
import { replaceControlCharacters, toOneLine } from '../../schemas/plain-text';
import { SOFTWARE_NAME, type ExportMeta } from '../export-meta';

/**
 * Thickness of 1 oz/ft² copper: 1 oz (28.35 g) spread over 1 ft² (929 cm²) at 8.96 g/cm³
 * is 34.8 µm (from memory; the trade rounds it to 35 µm).
 */
export const OUNCE_COPPER_THICKNESS_UM = 34.8;

export interface FabNotesExtras {
	/** File names of the export, listed in the notes. */
	readonly fileNames: readonly string[];
	/** Sizing and rule warnings to repeat as cautions. */
	readonly warnings: readonly string[];
	readonly solderMask: boolean;
	/** Design-rule violations the team waived for this export; absent for a clean design (the notes are then unchanged). */
	readonly waiver?: FabNotesWaiver;
}

/** A recorded waiver: who decided is in the export record; the fab reads why, and what was waived. */
export interface FabNotesWaiver {
	readonly reason: string;
	/** Name of the fab profile the artwork was checked against. */
	readonly profileName: string;
	/** One sentence per waived violation. */
	readonly violations: readonly string[];
}

/** User text inside one of our sentences: one line, in double quotes (a quote or backslash in it escaped as in JSON). */
export function quoteUserText(text: string): string {
	return JSON.stringify(toOneLine(text));
}

function waiverCautions(w: FabNotesWaiver): string[] {
	const count = `${w.violations.length} design-rule violation${w.violations.length === 1 ? '' : 's'}`;
	return [
		`DESIGN-RULE WAIVER: ${count} against the ${quoteUserText(w.profileName)} profile accepted by the design team. Reason: ${quoteUserText(w.reason)}`,
		...w.violations.map((v) => `Waived: ${v}`)
	];
}

const n = (v: number, digits = 3) => String(Number(v.toFixed(digits)));

/** Replaces every {{key}}; a key without a value is a programming error, not input. */
export function fillTemplate(template: string, values: Readonly<Record<string, string>>): string {
	return template.replace(/\{\{(\w+)\}\}/g, (_, key: string) => {
		if (!(key in values)) throw new Error(`fab-notes template placeholder {{${key}}} has no value`);
		return values[key];
	});
}

export function buildFabNotes(artwork: Artwork, meta: ExportMeta, extras: FabNotesExtras): string {
	const stack = artwork.stack;
	const total = stack.reduce((s, l) => s + l.thicknessMm, 0);
	const stackTable = stack
		.map((l) =>
			l.kind === 'copper'
				? `   - ${l.id.padEnd(14)} copper      ${n(l.thicknessMm * 1000, 1)} µm   (layer ${l.layerId})`
				: `   - ${l.id.padEnd(14)} dielectric  ${n(l.thicknessMm)} mm   εr ${l.relativePermittivity}, tanδ ${l.lossTangent}${l.bonding ? ' (bonding film)' : ''}`
		)
		.join('\n');
	const dielectric = stack.find((l) => l.kind === 'dielectric');
	const copper = stack.find((l) => l.kind === 'copper');
	const dielectricCount = stack.filter((l) => l.kind === 'dielectric').length;
	const laminate =
		dielectricCount > 1
			? `${dielectricCount} dielectric layers and ${artwork.metadata.copperLayerCount} copper layers, each with its own εr, tanδ and thickness as listed in the stack above (top to bottom); build them in that order.`
			: dielectric && dielectric.kind === 'dielectric'
			? `Relative permittivity εr ${dielectric.relativePermittivity} at the design frequency, loss tangent ${dielectric.lossTangent}, core thickness ${n(dielectric.thicknessMm)} mm.`
			: 'No dielectric in the stack.';
	const copperUm = copper ? copper.thicknessMm * 1000 : 0;
	const copperWeight = `${n(copperUm, 1)} µm (${n(copperUm / OUNCE_COPPER_THICKNESS_UM, 2)} oz/ft²)`;
	const byDiameter = new Map<string, { plated: boolean; count: number }>();
	for (const d of artwork.drills) {
		const key = `${d.plated ? 'PTH ' : 'NPTH'} ${n(d.diameterMm)}`;
		byDiameter.set(key, { plated: d.plated, count: (byDiameter.get(key)?.count ?? 0) + 1 });
	}
	const drillTable = byDiameter.size
		? [...byDiameter.entries()]
				.sort(([a], [b]) => a.localeCompare(b))
				.map(([key, v]) => `   - ${key} mm finished hole, ${v.count} hole(s)${v.plated ? ', plated through' : ''}`)
				.join('\n')
		: '   None: this design has no holes.';
	const probe = artwork.metadata.probe;
	const probeLine = !probe
		? ''
		: probe.model === 'plated-barrel'
			? `\n   Probe hole: plated barrel, at least ${probe.platingThicknessUm} µm copper on the hole wall, finished at ${n(probe.drillDiameterMm)} mm (the simulation models this barrel).`
			: `\n   Probe hole: a solid pin goes through the ${n(probe.drillDiameterMm)} mm finished hole (the simulation models a solid pin).`;
	const cautions = [
		'Do not scale, mirror or rotate the artwork; top copper is viewed from the top.',
		'Hold etched feature tolerance at ±0.025 mm or better on patch and feed edges; report over-etch.',
		'Do not add solder mask, silkscreen or copper over the patch and feed unless the mask layers say so.',
		...extras.warnings,
		...(extras.waiver ? waiverCautions(extras.waiver) : [])
	]
		.map((c) => `   - ${c}`)
		.join('\n');
	return fillTemplate(fabNotesTemplate, {
		// the title line: control characters become spaces, nothing else changes (old revisions re-export byte for byte)
		designName: replaceControlCharacters(meta.designName),
		revisionLabel: meta.revisionLabel,
		revisionDate: meta.revisionDate,
		software: `${SOFTWARE_NAME} ${meta.softwareVersion}`,
		boardWidthMm: n(artwork.board.widthMm),
		boardLengthMm: n(artwork.board.lengthMm),
		shape: artwork.metadata.shape,
		feedKind: artwork.metadata.feedKind,
		frequencyGhz: n(artwork.metadata.frequencyHz / 1e9, 4),
		stackTable,
		totalThicknessMm: n(total),
		laminate,
		copperWeight,
		maskAdvice: extras.solderMask
			? 'Solder mask: openings as drawn on the mask layers; the antenna copper stays bare.'
			: 'No solder mask: leave both sides bare (mask over the patch would shift its resonance).',
		drillTable: drillTable + probeLine,
		fileList: extras.fileNames.map((f) => `   - ${f}`).join('\n'),
		cautions
	});
}
