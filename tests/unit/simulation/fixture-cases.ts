// The golden cases of the Field check model writer: tests/fixtures/simulation/<case>/input.json (+ expected.xml).
import { readFileSync, readdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { buildArtwork } from '../../../src/lib/artwork';
import { buildFieldModel, type FieldModel } from '../../../src/lib/simulation';
import type { FieldCheckMode } from '../../../src/lib/schemas/field-check';
import { sizeDocument } from '../../fixtures/designs/size-document';

export const FIXTURES = resolve(__dirname, '../../fixtures/simulation');

export function fixtureCases(): string[] {
	return readdirSync(FIXTURES).filter((name) => !name.startsWith('broken-')).sort();
}

export function fixtureInput(name: string): unknown {
	return JSON.parse(readFileSync(join(FIXTURES, name, 'input.json'), 'utf8'));
}

/** The model the runner builds for a case (reference impedance as the runner picks it). */
export function fixtureModel(name: string, mode: FieldCheckMode = 'standard', refinement = 1): FieldModel {
	const sized = sizeDocument(fixtureInput(name));
	const zRef = sized.feed.kind === 'probe' ? sized.input.targetImpedanceOhm : sized.input.feedLineImpedanceOhm;
	return buildFieldModel(buildArtwork(sized), zRef, { mode, refinement });
}
