// Typed ISO 10303-21 data: a header and a list of entity instances whose attributes are typed values.

/**
 * One attribute value of an entity instance (ISO 10303-21:2016 §6.4 and §12.2): a reference `#n`,
 * a string, a real (always written with a decimal point), an integer, an enumeration `.T.`, a list,
 * an unset optional `$`, an attribute redeclared as derived `*`, or a typed value such as
 * `LENGTH_MEASURE(1.E-07)`.
 */
export type StepValue =
	| { readonly kind: 'ref'; readonly id: number }
	| { readonly kind: 'string'; readonly text: string }
	| { readonly kind: 'real'; readonly value: number }
	| { readonly kind: 'integer'; readonly value: number }
	| { readonly kind: 'enum'; readonly name: string }
	| { readonly kind: 'list'; readonly items: readonly StepValue[] }
	| { readonly kind: 'unset' }
	| { readonly kind: 'derived' }
	| { readonly kind: 'typed'; readonly typeName: string; readonly value: StepValue };

/** One partial entity: `NAME(attributes…)`. */
export interface StepRecord {
	readonly name: string;
	readonly values: readonly StepValue[];
}

export type StepEntity =
	/** `#id=NAME(…);` — a simple entity instance (ISO 10303-21:2016 §12.2.2). */
	| { readonly type: 'simple'; readonly id: number; readonly record: StepRecord }
	/** `#id=(A(…)B(…));` — a complex instance in external mapping, partial records in alphabetical order (§12.2.5). */
	| { readonly type: 'complex'; readonly id: number; readonly records: readonly StepRecord[] };

/** What the HEADER section says (ISO 10303-21:2016 §8.2: FILE_DESCRIPTION, FILE_NAME, FILE_SCHEMA). */
export interface StepHeader {
	readonly description: readonly string[];
	readonly fileName: string;
	/** ISO 8601 time stamp, from the revision date (never the clock). */
	readonly timeStamp: string;
	readonly author: string;
	readonly organization: string;
	readonly preprocessorVersion: string;
	readonly originatingSystem: string;
	readonly schema: string;
	/** Free comment lines written as one comment before the DATA section. */
	readonly comments: readonly string[];
}

export interface StepDocument {
	readonly header: StepHeader;
	readonly entities: readonly StepEntity[];
}

export const ref = (id: number): StepValue => ({ kind: 'ref', id });
export const str = (text: string): StepValue => ({ kind: 'string', text });
export const real = (value: number): StepValue => ({ kind: 'real', value });
export const int = (value: number): StepValue => ({ kind: 'integer', value });
export const enumValue = (name: string): StepValue => ({ kind: 'enum', name });
export const list = (items: readonly StepValue[]): StepValue => ({ kind: 'list', items });
export const bool = (value: boolean): StepValue => enumValue(value ? 'T' : 'F');
export const unset: StepValue = { kind: 'unset' };
export const derived: StepValue = { kind: 'derived' };
export const typed = (typeName: string, value: StepValue): StepValue => ({ kind: 'typed', typeName, value });
