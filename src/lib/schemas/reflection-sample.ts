// One frequency of a one-port's reflection, S11 as a complex number: what the Touchstone reader gives, an upload stores and the measured-response analysis reads.
import { z } from 'zod';

/** A complex reflection coefficient Γ in rectangular form. */
export const reflectionValueSchema = z.object({ re: z.number(), im: z.number() });
export type ReflectionValue = z.infer<typeof reflectionValueSchema>;

/**
 * One measured (or read) frequency of S11. The Field check's simulated point carries the input
 * impedance too and is `S11Sample` (`schemas/field-check.ts`).
 */
export const reflectionSampleSchema = z.object({ frequencyHz: z.number(), s11: reflectionValueSchema });
export type ReflectionSample = z.infer<typeof reflectionSampleSchema>;
