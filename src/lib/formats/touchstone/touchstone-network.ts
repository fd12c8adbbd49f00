// What the Touchstone reader returns and the writer takes: a 1- or 2-port S-parameter network in hertz and ohms.

/** A complex number in rectangular form (the reader converts MA and DB pairs to this). */
export interface Complex {
	re: number;
	im: number;
}

export const frequencyUnits = ['Hz', 'kHz', 'MHz', 'GHz'] as const;
export type FrequencyUnit = (typeof frequencyUnits)[number];

/** Hertz per one of each frequency unit of the option line. */
export const HZ_PER_FREQUENCY_UNIT: Readonly<Record<FrequencyUnit, number>> = { Hz: 1, kHz: 1e3, MHz: 1e6, GHz: 1e9 };

/**
 * How each complex value is written as a pair of numbers:
 * RI = real, imaginary; MA = linear magnitude, angle in degrees; DB = 20·log10(magnitude), angle in degrees.
 * Example: 0.1∠−90° is `0 -0.1` in RI, `0.1 -90` in MA and `-20 -90` in DB.
 */
export const dataFormats = ['RI', 'MA', 'DB'] as const;
export type DataFormat = (typeof dataFormats)[number];

/** Which Touchstone syntax a file used: "1" = option line and data only (1.0/1.1), "2.0"/"2.1" = keyword files. */
export type TouchstoneVersion = '1' | '2.0' | '2.1';

export type PortCount = 1 | 2;

/** One frequency of network data. */
export interface NetworkPoint {
	frequencyHz: number;
	/**
	 * S-parameters at this frequency. 1-port: [S11]. 2-port: always [S11, S21, S12, S22] here
	 * (the order of version 1 files and of `[Two-Port Data Order] 21_12`), whatever order the file used.
	 */
	s: Complex[];
}

/** One frequency of two-port noise data (kept so that a read file can be written back whole). */
export interface NoisePoint {
	frequencyHz: number;
	/** Minimum noise figure, dB. */
	minimumNoiseFigureDb: number;
	/** Source reflection coefficient for the minimum noise figure. */
	optimumSourceReflection: Complex;
	/** Effective noise resistance normalised to the reference impedance (version 1) or in ohms (version 2). */
	noiseResistance: number;
}

export interface TouchstoneNetwork {
	version: TouchstoneVersion;
	portCount: PortCount;
	/** Frequency unit of the option line (the data is converted to hertz; the unit is kept for writing back). */
	frequencyUnit: FrequencyUnit;
	/** Pair format of the option line (kept for writing back). */
	format: DataFormat;
	/** Reference impedance of each port, Ω (from `R n` on the option line or `[Reference]`). */
	referenceImpedanceOhm: number[];
	/** Strictly increasing in frequency. */
	points: NetworkPoint[];
	/** Two-port noise parameters, strictly increasing in frequency; empty when the file has none. */
	noise: NoisePoint[];
}
