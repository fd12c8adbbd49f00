// Port time series → S11, Zin, resonance, −10 dB band and VSWR, by a direct DFT of voltage and current.
import type { FieldCheckResult, S11Sample } from '../schemas/field-check';
import type { PortSeries } from './types';

export interface PortAnalysisInput {
	voltage: PortSeries;
	current: PortSeries;
	referenceImpedanceOhm: number;
	targetFrequencyHz: number;
	/** Frequencies to evaluate: lowHz to highHz in `pointCount` equal steps. */
	band: { lowHz: number; highHz: number };
	pointCount?: number;
}

export type PortAnalysis = Pick<FieldCheckResult, 'samples' | 'resonance' | 'deviationFraction' | 's11AtTargetDb' | 'band' | 'minimumVswr'>;

/**
 * S11 = (Z − Zref)/(Z + Zref) with Z = V(f)/I(f). The engine samples current half a timestep
 * after voltage; the DFT uses each series' own time stamps, so the offset is honoured.
 */
export function analyzePortSeries(input: PortAnalysisInput): PortAnalysis {
	void input;
	throw new Error('analyzePortSeries: not built yet');
}

/** Reads a port_ut / port_it text file ("% comment" lines, then "t value" rows). */
export function parsePortSeries(text: string): PortSeries {
	void text;
	throw new Error('parsePortSeries: not built yet');
}

export type { S11Sample };
