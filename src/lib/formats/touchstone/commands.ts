// The typed line list the Touchstone writer builds before formatting: meaning apart from digits and spacing.
import type { DataFormat, FrequencyUnit } from './touchstone-network';

export type TouchstoneCommand =
	/** `! text` */
	| { type: 'comment'; text: string }
	/** `[Name] args…` (version 2 only). */
	| { type: 'keyword'; name: string; args: string[] }
	/** `# <unit> S <format> R <ohms…>`: more than one R value only in version 1.1. */
	| { type: 'option'; frequencyUnit: FrequencyUnit; format: DataFormat; referenceImpedanceOhm: number[] }
	/** A data line: numbers already in the file's frequency unit and pair format. */
	| { type: 'data'; values: number[] };
