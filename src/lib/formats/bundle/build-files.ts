// Sized design → every chosen file, named by our pattern, with the manifest last. The one pipeline the CLI and the server share.
import { buildArtwork, type Artwork } from '../../artwork';
import type { SizedDesign } from '../../rf';
import { size } from '../../rf';
import { toDxf } from '../dxf';
import { toExcellon } from '../excellon';
import type { ExportMeta } from '../export-meta';
import { buildFabNotes, type FabNotesWaiver } from '../fab-notes';
import { toGerber } from '../gerber';
import { buildManifest, serializeManifest, type ExportFile } from '../manifest';
import { toStep } from '../step';
import { toSvg, type SvgWindow } from '../svg';
import { buildSweepDocument, serializeSweep } from '../sweep';
import { buildArrayPatternDocument, serializeArrayPattern } from '../array-pattern';
import { builtInFabProfileFor, type FabProfile } from '../../schemas/fab-profile';
import { exportFormats, type ExportFormat } from './export-formats';
import { exportFileName } from './file-names';

export interface BuildFilesEnvironment {
	/** Needed for 'svg': svgdom's createSVGWindow() in Node, `window` in a browser. */
	readonly svgWindow?: SvgWindow;
	/** Waived design-rule violations, printed in the fab notes' cautions (none: the notes are as before). */
	readonly waiver?: FabNotesWaiver;
	/** The fab profile the design was checked against, named in the fab notes with its figures; default: the built-in that can build the stack. */
	readonly profile?: FabProfile;
}

const encoder = new TextEncoder();
const text = (name: string, body: string): ExportFile => ({ name, bytes: encoder.encode(body) });

export function buildFiles(sized: SizedDesign, meta: ExportMeta, formats: readonly ExportFormat[] = exportFormats, env: BuildFilesEnvironment = {}): ExportFile[] {
	const artwork: Artwork = buildArtwork(sized);
	const want = (f: ExportFormat) => formats.includes(f);
	const files: ExportFile[] = [];
	if (want('gerber')) for (const layer of artwork.layers) files.push(text(exportFileName(meta, layer.id, 'gbr'), toGerber(artwork, layer.id, meta)));
	if (want('drill')) {
		if (artwork.drills.some((d) => d.plated)) files.push(text(exportFileName(meta, 'drill-plated', 'drl'), toExcellon(artwork, true, meta)));
		if (artwork.drills.some((d) => !d.plated)) files.push(text(exportFileName(meta, 'drill-non-plated', 'drl'), toExcellon(artwork, false, meta)));
	}
	if (want('dxf')) files.push(text(exportFileName(meta, 'drawing', 'dxf'), toDxf(artwork)));
	if (want('svg')) {
		if (!env.svgWindow) throw new Error('buildFiles: the svg format needs env.svgWindow');
		files.push(text(exportFileName(meta, 'drawing', 'svg'), toSvg(artwork, meta, env.svgWindow)));
	}
	if (want('sweep')) {
		// the design itself as a one-point sweep, so tools reading sweeps read single designs too
		const doc = buildSweepDocument(sized.input, { axes: [{ field: 'frequencyHz', values: [sized.input.frequencyHz] }] }, meta);
		files.push(text(exportFileName(meta, 'design', 'sweep.json'), serializeSweep(doc)));
		// arrays only: the array-factor estimate with its plot-ready cuts
		const pattern = buildArrayPatternDocument(sized, meta);
		if (pattern) files.push(text(exportFileName(meta, 'array-pattern', 'json'), serializeArrayPattern(pattern)));
	}
	if (want('step')) {
		const name = exportFileName(meta, 'board', 'step');
		files.push(text(name, toStep(artwork, meta, name)));
	}
	const manifestName = exportFileName(meta, 'manifest', 'json');
	if (want('notes')) {
		const notesName = exportFileName(meta, 'fab-notes', 'txt');
		const names = [...files.map((f) => f.name), notesName, manifestName];
		const profile = env.profile ?? builtInFabProfileFor(artwork.metadata.copperLayerCount);
		files.push(text(notesName, buildFabNotes(artwork, meta, { fileNames: names, solderMask: sized.input.solderMask, profile, input: sized.input, ...(env.waiver ? { waiver: env.waiver } : {}) })));
	}
	files.push(text(manifestName, serializeManifest(buildManifest(files, meta))));
	return files;
}

/** Same, from a design-input document: sizes it first (InputError for bad input). */
export function buildFilesFromInput(raw: unknown, meta: ExportMeta, formats?: readonly ExportFormat[], env?: BuildFilesEnvironment): ExportFile[] {
	return buildFiles(size(raw), meta, formats, env);
}
