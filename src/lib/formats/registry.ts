// The format registry: every file format an export can hold, listed once. The download panel, the API enum,
// the content types, the CLI's --formats and the bundle all read it (ARCHITECTURE.md, "Formats are listed once").
import type { Artwork } from '../artwork';
import type { SizedDesign } from '../rf';
import type { DesignInput } from '../schemas';
import { builtInFabProfileFor, type FabProfile } from '../schemas/fab-profile';
import { buildArrayPatternDocument, serializeArrayPattern } from './array-pattern';
import { exportFileName } from './bundle/file-names';
import { drawingResolutionMm, type DrawingSheetOptions } from './drawing-sheet';
import { toDxf } from './dxf';
import { toExcellon } from './excellon';
import type { ExportMeta } from './export-meta';
import { buildFabNotes, type FabNotesWaiver } from './fab-notes';
import { formatIds, type FormatId } from './format-ids';
import { toGerber } from './gerber';
import { toStep } from './step';
import type { ExportFile } from './manifest';
import { toSvg } from './svg';
import { buildSweepDocument, serializeSweep } from './sweep';

/**
 * A design ready for the writers: its validated input, the sized design and the artwork built from it
 * once. Only `design/pipeline` makes one (`prepare`), so no writer ever builds the artwork again.
 */
export interface PreparedDesign {
	readonly input: DesignInput;
	readonly sized: SizedDesign;
	readonly artwork: Artwork;
}

/** What a writer may need besides the design and the names: the files written before it, and a waiver. */
export interface FormatWriteContext {
	/** Names of the files this export holds before this format's (the fab notes list them). */
	readonly earlierFileNames: readonly string[];
	/** Name of the manifest that ends the export. */
	readonly manifestName: string;
	/** Waived design-rule violations, printed in the fab notes' cautions. */
	readonly waiver?: FabNotesWaiver;
	/** The fab profile the design was checked against (the fab notes name it and take their figures from it). */
	readonly profile?: FabProfile;
}

export interface FormatEntry {
	readonly id: FormatId;
	/** Shown on the download panel and in the API reference. */
	readonly title: string;
	/** One line under the title on the download panel. */
	readonly detail: string;
	/** Extension of the format's main file (a format may write several files, e.g. one Gerber per layer). */
	readonly extension: string;
	/** Content type of a download that is one file of this format (several files are delivered as a zip). */
	readonly contentType: string;
	/** False when the design has nothing of this kind (no holes: no drill file); such a format is offered nowhere. */
	appliesTo(artwork: Artwork): boolean;
	/** The format's files for the design, named by our pattern. Pure and deterministic. */
	write(prepared: PreparedDesign, meta: ExportMeta, context: FormatWriteContext): ExportFile[];
}

/** What the drawings print besides the artwork: sizes to the profile's resolution, the ordered laminate's name. */
export function drawingSheetOptions(prepared: PreparedDesign, profile: FabProfile | undefined): DrawingSheetOptions {
	const name = prepared.input.laminate?.name;
	return { resolutionMm: drawingResolutionMm(profile), ...(name ? { laminateName: name } : {}) };
}

const encoder = new TextEncoder();
const textFile = (name: string, body: string): ExportFile => ({ name, bytes: encoder.encode(body) });
const always = () => true;

const entries: { readonly [K in FormatId]: FormatEntry & { readonly id: K } } = {
	gerber: {
		id: 'gerber',
		title: 'Gerber',
		detail: 'copper, profile and mask layers',
		extension: 'gbr',
		contentType: 'application/vnd.gerber',
		appliesTo: always,
		write: ({ artwork }, meta) => artwork.layers.map((layer) => textFile(exportFileName(meta, layer.id, 'gbr'), toGerber(artwork, layer.id, meta)))
	},
	drill: {
		id: 'drill',
		title: 'Excellon drill',
		detail: 'probe and mounting holes',
		extension: 'drl',
		contentType: 'text/plain; charset=utf-8',
		appliesTo: (artwork) => artwork.drills.length > 0,
		write: ({ artwork }, meta) =>
			[true, false]
				.filter((plated) => artwork.drills.some((hole) => hole.plated === plated))
				.map((plated) => textFile(exportFileName(meta, plated ? 'drill-plated' : 'drill-non-plated', 'drl'), toExcellon(artwork, plated, meta)))
	},
	dxf: {
		id: 'dxf',
		title: 'DXF',
		detail: 'outline and copper for mechanical CAD',
		extension: 'dxf',
		contentType: 'image/vnd.dxf',
		appliesTo: always,
		write: (prepared, meta, context) => [textFile(exportFileName(meta, 'drawing', 'dxf'), toDxf(prepared.artwork, meta, drawingSheetOptions(prepared, context.profile)))]
	},
	svg: {
		id: 'svg',
		title: 'SVG drawing',
		detail: 'dimensioned top view',
		extension: 'svg',
		contentType: 'image/svg+xml',
		appliesTo: always,
		write: (prepared, meta, context) => [textFile(exportFileName(meta, 'drawing', 'svg'), toSvg(prepared.artwork, meta, drawingSheetOptions(prepared, context.profile)))]
	},
	sweep: {
		id: 'sweep',
		title: 'Sweep definition',
		detail: 'JSON for the simulation',
		extension: 'sweep.json',
		contentType: 'application/json',
		appliesTo: always,
		write: (prepared, meta) => {
			const { sized } = prepared;
			// the design itself as a one-point sweep, so tools reading sweeps read single designs too
			const doc = buildSweepDocument(sized.input, { axes: [{ field: 'frequencyHz', values: [sized.input.frequencyHz] }] }, meta, prepared);
			const files = [textFile(exportFileName(meta, 'design', 'sweep.json'), serializeSweep(doc))];
			// arrays only: the array-factor estimate with its plot-ready cuts
			const pattern = buildArrayPatternDocument(sized, meta);
			if (pattern) files.push(textFile(exportFileName(meta, 'array-pattern', 'json'), serializeArrayPattern(pattern)));
			return files;
		}
	},
	step: {
		id: 'step',
		title: '3-D board (STEP)',
		detail: 'layers, coppers and holes as solids; not in the zip',
		extension: 'step',
		// ISO 10303-21 clear text: model/step is the IANA-registered type (from memory: registered for ISO/TC 184/SC 4, 2021; not re-checked)
		contentType: 'model/step',
		appliesTo: always,
		write: ({ artwork }, meta) => {
			const name = exportFileName(meta, 'board', 'step');
			return [textFile(name, toStep(artwork, meta, name))];
		}
	},
	notes: {
		id: 'notes',
		title: 'Fab notes',
		detail: 'stack-up and build notes',
		extension: 'txt',
		contentType: 'text/plain; charset=utf-8',
		appliesTo: always,
		write: ({ sized, artwork }, meta, context) => {
			const name = exportFileName(meta, 'fab-notes', 'txt');
			const fileNames = [...context.earlierFileNames, name, context.manifestName];
			// the profile the design was checked against, named with its figures; without one, the built-in that can build the stack
			const profile = context.profile ?? builtInFabProfileFor(artwork.metadata.copperLayerCount);
			const extras = { fileNames, solderMask: sized.input.solderMask, profile, input: sized.input, ...(sized.maskCover ? { maskCover: sized.maskCover } : {}), ...(context.waiver ? { waiver: context.waiver } : {}) };
			return [textFile(name, buildFabNotes(artwork, meta, extras))];
		}
	}
};

/** Every format, in the order the lists name them (formats/format-ids.ts; an export writes in `writeOrder`). */
export const formatRegistry: readonly FormatEntry[] = formatIds.map((id) => entries[id]);

export function formatEntry(id: FormatId): FormatEntry {
	return entries[id];
}

/** The formats that apply to this artwork (a design without holes has no drill format). */
export function applicableFormats(artwork: Artwork): FormatEntry[] {
	return formatRegistry.filter((f) => f.appliesTo(artwork));
}

/** Content type of a delivered file, by the registry entry whose extension it ends with (a zip for several files). */
export function contentTypeOfFile(fileName: string): string {
	if (fileName.endsWith('.zip')) return 'application/zip';
	const entry = formatRegistry.find((f) => fileName.endsWith(`.${f.extension}`));
	if (entry) return entry.contentType;
	return fileName.endsWith('.json') ? 'application/json' : 'application/octet-stream';
}
