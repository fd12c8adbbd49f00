// BENCH REFERENCE ONLY: the work one bundle download did before the single pipeline, kept so `npm run bench`
// times "before" and "after" in the same run. The artwork was built three times (the gate, the files, the read-back),
// the one-point sweep drew it a fourth time, and every file was hashed twice (the hand-written SHA-256 in the
// manifest, node:crypto for the export record). Never imported by src/.
import { createHash } from 'node:crypto';
import { buildArtwork } from '../../src/lib/artwork';
import { checkArtwork } from '../../src/lib/drc';
import { bundleFormatIds, buildBundle, buildSweepDocument, exportFileName, formatEntry, serializeSweep, serializeManifest, writeOrder, type ExportFile, type ExportMeta } from '../../src/lib/formats';
import { checkReadBack, isFabFileName } from '../../src/lib/formats/readback';
import type { SizedDesign } from '../../src/lib/rf';
import type { FabProfile } from '../../src/lib/schemas/fab-profile';
import { legacySha256Hex } from './legacy-sha256';

const encoder = new TextEncoder();

export async function legacyBundleDownload(sized: SizedDesign, meta: ExportMeta, profile: FabProfile): Promise<{ body: Uint8Array; sha256: string }> {
	checkArtwork(buildArtwork(sized), profile);
	const artwork = buildArtwork(sized);
	const prepared = { input: sized.input, sized, artwork };
	const manifestName = exportFileName(meta, 'manifest', 'json');
	const files: ExportFile[] = [];
	for (const format of writeOrder.map(formatEntry)) {
		if (!(bundleFormatIds as readonly string[]).includes(format.id) || !format.appliesTo(artwork)) continue;
		if (format.id === 'sweep') {
			// the old one-point sweep sized and drew the design again
			const doc = buildSweepDocument(sized.input, { axes: [{ field: 'frequencyHz', values: [sized.input.frequencyHz] }] }, meta);
			files.push({ name: exportFileName(meta, 'design', 'sweep.json'), bytes: encoder.encode(serializeSweep(doc)) });
			continue;
		}
		files.push(...format.write(prepared, meta, { earlierFileNames: files.map((f) => f.name), manifestName }));
	}
	const manifest = { format: 'fringefield-manifest', formatVersion: 1, design: meta.designSlug, revision: meta.revisionLabel, revisionDate: meta.revisionDate, files: files.map((f) => ({ name: f.name, sizeBytes: f.bytes.length, sha256: legacySha256Hex(f.bytes) })) } as const;
	files.push({ name: manifestName, bytes: encoder.encode(serializeManifest(manifest)) });
	checkReadBack(buildArtwork(sized), files.filter((f) => isFabFileName(f.name)));
	const body = await buildBundle(files, meta.revisionDate);
	for (const f of files) createHash('sha256').update(f.bytes).digest('hex');
	return { body, sha256: createHash('sha256').update(body).digest('hex') };
}
