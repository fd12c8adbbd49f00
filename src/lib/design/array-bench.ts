// Bench workload: the files (Gerber, drill, DXF, SVG) of a square inset-fed array, for scripts/bench to time at 8×8 and 32×32.
import { createExportMeta } from '../formats/export-meta';
import type { FormatId } from '../formats/format-ids';
import type { HashedFile } from '../formats/manifest';
import { parseDesignInput, type DesignInputDocument } from '../schemas';
import { prepare, writeFiles } from './pipeline';

/** The formats the array bench times. */
export const ARRAY_BENCH_FORMATS: readonly FormatId[] = ['gerber', 'drill', 'dxf', 'svg'];

/** A side × side inset-fed array at 2.45 GHz on 0.8 mm, εr 3.55 (demo data); side a power of two, 1–64. */
export function arrayBenchDocument(side: number): DesignInputDocument {
	return {
		name: `Bench array ${side}x${side}`,
		frequencyHz: 2.45e9,
		feed: 'inset',
		substrate: { relativePermittivity: 3.55, heightMm: 0.8, lossTangent: 0.0027 },
		array: { columns: side, rows: side, spacingXWavelengths: 0.7, spacingYWavelengths: 0.7 }
	};
}

/**
 * Sizes, draws and writes the bench array (no zip: the bench times the writers). The array has no
 * holes, so the drill format does not apply; the manifest comes last as in every export.
 */
export function buildArrayBenchFiles(side: number): Promise<HashedFile[]> {
	const meta = createExportMeta({ designName: `Bench array ${side}x${side}`, revisionLabel: 'A', revisionDate: '2026-12-02' });
	return writeFiles(prepare(parseDesignInput(arrayBenchDocument(side))), ARRAY_BENCH_FORMATS, meta);
}
