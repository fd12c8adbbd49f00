// Finds the openEMS binary and its version (null when it is not installed).
export interface EngineInfo {
	name: 'openEMS';
	version: string;
	binary: string;
}

/** The engine on PATH (or FRINGEFIELD_OPENEMS), or null. */
export async function findEngine(): Promise<EngineInfo | null> {
	throw new Error('findEngine: not built yet');
}
