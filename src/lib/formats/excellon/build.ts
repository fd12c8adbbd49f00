// Artwork drills of one kind (plated or not) → Excellon commands; tools numbered by ascending diameter.
import type { Artwork, ArtworkProbe } from '../../artwork';
import { SOFTWARE_NAME, type ExportMeta } from '../export-meta';
import type { ExcellonCommand } from './commands';

/** The stated probe model as one ASCII comment line (drill machines' software may not read UTF-8). */
export function probeComment(probe: ArtworkProbe): string {
	const hole = probe.drillDiameterMm.toFixed(3);
	return probe.model === 'plated-barrel'
		? `probe: plated barrel with ${probe.platingThicknessUm} um copper wall; finished hole ${hole} mm`
		: `probe: solid pin through the ${hole} mm finished hole`;
}

export function buildExcellonCommands(artwork: Artwork, plated: boolean, meta: ExportMeta): ExcellonCommand[] {
	const drills = artwork.drills.filter((d) => d.plated === plated);
	const from = drills.reduce((low, d) => Math.min(low, d.fromCopper), 1);
	const to = drills.reduce((high, d) => Math.max(high, d.toCopper), artwork.metadata.copperLayerCount);
	const out: ExcellonCommand[] = [{ type: 'header-start' }];
	out.push({ type: 'comment', text: `${SOFTWARE_NAME} ${meta.designName} revision ${meta.revisionLabel}: ${plated ? 'plated' : 'non-plated'} holes` });
	const probe = artwork.metadata.probe;
	if (probe && plated && drills.some((d) => d.role === 'probe')) out.push({ type: 'comment', text: probeComment(probe) });
	out.push({ type: 'attribute', name: 'TF.GenerationSoftware', values: [SOFTWARE_NAME, SOFTWARE_NAME, meta.softwareVersion] });
	out.push({ type: 'attribute', name: 'TF.CreationDate', values: [`${meta.revisionDate}T00:00:00+00:00`] });
	out.push({ type: 'attribute', name: 'TF.SameCoordinates', values: [`${meta.designSlug}-${meta.revisionLabel}`] });
	out.push({ type: 'attribute', name: 'TF.FileFunction', values: plated ? ['Plated', String(from), String(to), 'PTH'] : ['NonPlated', String(from), String(to), 'NPTH'] });
	out.push({ type: 'attribute', name: 'TF.FilePolarity', values: ['Positive'] });
	out.push({ type: 'units', units: 'metric' });
	const diameters = [...new Set(drills.map((d) => d.diameterMm.toFixed(3)))].sort((a, b) => Number(a) - Number(b));
	const toolOf = new Map(diameters.map((d, i) => [d, i + 1]));
	for (const d of diameters) {
		// a tool that drills only launch vias is a via drill (Gerber X2 spec §5.6.10, .AperFunction ViaDrill); one holding only
		// mounting holes drills them for a screw: MechanicalDrill (Gerber Layer Format Specification, drill aperture functions,
		// from memory); every other hole is a component's
		const holes = drills.filter((h) => h.diameterMm.toFixed(3) === d);
		const use = holes.every((h) => h.role === 'launch-via') ? 'ViaDrill' : holes.every((h) => h.role === 'mounting') ? 'MechanicalDrill' : 'ComponentDrill';
		out.push({ type: 'attribute', name: 'TA.AperFunction', values: plated ? ['Plated', 'PTH', use] : ['NonPlated', 'NPTH', use] });
		out.push({ type: 'define-tool', tool: toolOf.get(d)!, diameterMm: Number(d) });
	}
	out.push({ type: 'header-end' }, { type: 'absolute' }, { type: 'drill-mode' });
	for (const d of diameters) {
		out.push({ type: 'select-tool', tool: toolOf.get(d)! });
		const hits = drills.filter((h) => h.diameterMm.toFixed(3) === d).sort((a, b) => a.center[0] - b.center[0] || a.center[1] - b.center[1]);
		for (const h of hits) out.push({ type: 'hit', at: h.center });
	}
	out.push({ type: 'end' });
	return out;
}
