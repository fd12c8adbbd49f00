// Typed Excellon drill commands.
import type { Point } from '../../geometry';

export type ExcellonCommand =
	| { readonly type: 'header-start' }
	/** `; text` comment; X2 attributes travel as `; #@! TF.…` comments. */
	| { readonly type: 'comment'; readonly text: string }
	| { readonly type: 'attribute'; readonly name: string; readonly values: readonly string[] }
	/** METRIC: millimetres with decimal points. */
	| { readonly type: 'units'; readonly units: 'metric' }
	| { readonly type: 'define-tool'; readonly tool: number; readonly diameterMm: number }
	| { readonly type: 'header-end' }
	| { readonly type: 'absolute' }
	| { readonly type: 'drill-mode' }
	| { readonly type: 'select-tool'; readonly tool: number }
	| { readonly type: 'hit'; readonly at: Point }
	| { readonly type: 'end' };
