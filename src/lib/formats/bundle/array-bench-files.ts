// Bench workload: the files (Gerber, drill, DXF, SVG) of a square inset-fed array, for scripts/bench to time at 8×8 and 32×32.
import { size } from '../../rf';
import type { DesignInputDocument } from '../../schemas';
import { createExportMeta } from '../export-meta';
import type { ExportFile } from '../manifest';
import { buildFiles, type BuildFilesEnvironment } from './build-files';
import type { ExportFormat } from './export-formats';

/** The formats the array bench times. */
export const ARRAY_BENCH_FORMATS: readonly ExportFormat[] = ['gerber', 'drill', 'dxf', 'svg'];

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
 * holes, so the drill family writes no file; the manifest comes last as in every export.
 */
export function buildArrayBenchFiles(side: number, env: BuildFilesEnvironment): ExportFile[] {
	const meta = createExportMeta({ designName: `Bench array ${side}x${side}`, revisionLabel: 'A', revisionDate: '2026-12-02' });
	return buildFiles(size(arrayBenchDocument(side)), meta, ARRAY_BENCH_FORMATS, env);
}
