// Route matcher for download routes: only the export kinds we deliver (anything else never reaches the handler → 404).
import type { ParamMatcher } from '@sveltejs/kit';
import { isExportKind } from '$lib/schemas/api';

export const match: ParamMatcher = (param) => isExportKind(param);
