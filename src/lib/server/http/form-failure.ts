// One shape for every failed form action: which action, the sentence to show, messages per field and what was typed.
import { fail } from '@sveltejs/kit';
import type { InputIssue } from '$lib/schemas/input-error';

/** One message beside one field: a form control name (or a document path), "" for the whole form. */
export interface FieldError {
	field: string;
	message: string;
}

/**
 * What a form action answers when it refuses: `fail(status, FormFailure)`. Pages read `form.action` to know which of
 * their forms failed, `form.message` for the sentence, `form.fieldErrors` beside the fields and `form.values` to keep
 * what was typed. `detail` carries the few facts one page needs besides (a refusal's code, a file's line number, the
 * measurement a deletion asks to confirm).
 */
export interface FormFailure<V = Record<string, string>, D extends Record<string, unknown> = Record<string, never>> {
	action: string;
	message: string;
	fieldErrors?: FieldError[];
	values?: V;
	detail?: D;
}

/** `fail(status, failure)` with the one shape. */
export function formFail<V = Record<string, string>, D extends Record<string, unknown> = Record<string, never>>(status: number, failure: FormFailure<V, D>) {
	return fail(status, failure);
}

/** Input issues as field errors, keyed by the issue's path ("" for the document). */
export function fieldErrorsOf(issues: readonly InputIssue[], field: (path: string) => string = (p) => p): FieldError[] {
	return issues.map((i) => ({ field: field(i.path), message: i.message }));
}
