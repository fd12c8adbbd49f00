// Writes a network as Touchstone text (version 1.1 or 2.0); the reader reads it back to the same network.
import { buildTouchstoneCommands, type TouchstoneWriteOptions } from './build';
import { serializeTouchstone } from './serialize';
import type { TouchstoneNetwork } from './touchstone-network';

/** Throws InputError for a network no file can hold (non-finite values, unordered frequencies, 0 in DB). */
export function writeTouchstone(network: TouchstoneNetwork, options: TouchstoneWriteOptions = {}): string {
	return serializeTouchstone(buildTouchstoneCommands(network, options));
}
