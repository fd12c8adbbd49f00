// Units: the one place where conversions happen. The core works in millimetres and hertz.

/** Speed of light in vacuum, m/s (exact, SI definition). */
export const SPEED_OF_LIGHT_M_PER_S = 299_792_458;
/** Vacuum permeability µ0, H/m (CODATA 2018: 1.25663706212e-6). */
export const VACUUM_PERMEABILITY_H_PER_M = 1.25663706212e-6;
/** Vacuum permittivity ε0, F/m (CODATA 2018). */
export const VACUUM_PERMITTIVITY_F_PER_M = 8.8541878128e-12;
/** Wave impedance of free space η0 = µ0·c, Ω. */
export const FREE_SPACE_IMPEDANCE_OHM = VACUUM_PERMEABILITY_H_PER_M * SPEED_OF_LIGHT_M_PER_S;

export const mmFromM = (m: number): number => m * 1000;
export const mFromMm = (mm: number): number => mm / 1000;
export const mmFromUm = (um: number): number => um / 1000;
export const umFromMm = (mm: number): number => mm * 1000;
export const mmFromInch = (inch: number): number => inch * 25.4;
export const inchFromMm = (mm: number): number => mm / 25.4;
export const hzFromGhz = (ghz: number): number => ghz * 1e9;
export const ghzFromHz = (hz: number): number => hz / 1e9;
export const radFromDeg = (deg: number): number => (deg * Math.PI) / 180;
export const degFromRad = (rad: number): number => (rad * 180) / Math.PI;
export const dbFromPowerRatio = (ratio: number): number => 10 * Math.log10(ratio);
export const powerRatioFromDb = (db: number): number => 10 ** (db / 10);

/** Free-space wavelength λ0 in millimetres at a frequency in hertz. */
export const freeSpaceWavelengthMm = (frequencyHz: number): number => mmFromM(SPEED_OF_LIGHT_M_PER_S / frequencyHz);

export * from './display-units';
export * from './parse-quantity';
export * from './format-quantity';
