// The current team's fab profiles: the built-in one and the team's own; editors add entries.
import { formFail } from '$lib/server/http/form-failure';
import { authorize, can } from '$lib/server/access';
import { getDb } from '$lib/server/db';
import { findDisplayUnits, requireUser } from '$lib/server/accounts';
import { requireTeamRole } from '$lib/server/designs/design-access';
import { addFabProfile, listFabProfiles } from '$lib/server/fab-profiles';
import { currentTeam } from '$lib/server/teams/current-team';
import { InputError } from '$lib/schemas';
import { isLengthUnit, parseLengthMm } from '$lib/units';
import type { Actions, PageServerLoad } from './$types';

const lengthKeys = ['minTraceWidthMm', 'minSpacingMm', 'minDrillMm', 'minAnnularRingMm', 'copperToEdgeMm', 'minSlotWidthMm', 'etchToleranceMm', 'platedDrillToleranceMm', 'nonPlatedDrillToleranceMm'] as const;

/** The legend rules: optional, blank takes the stated default (LEGEND_DEFAULTS). */
const legendKeys = ['minLegendWidthMm', 'legendToOpeningMm', 'legendToEdgeMm'] as const;

/** The process keys beside the lengths: copper layers, mixed cores (a checkbox), thickness ± %, finish. */
const processKeys = ['maxCopperLayers', 'mixedCores', 'boardThicknessTolerancePercent', 'finish'] as const;

export const load: PageServerLoad = async (event) => {
	requireUser(event.locals, event.url);
	const { current } = await currentTeam(event.locals.identity, event.cookies);
	if (!current) return { team: null, profiles: [], canAdd: false };
	authorize(current.role, 'team.read');
	// Adding to the team's fab list is library work like adding a laminate: the same right.
	return { team: current, profiles: await listFabProfiles(getDb(), current.id), canAdd: can(current.role, 'fab-profile.write') };
};

export const actions: Actions = {
	add: async (event) => {
		const data = await event.request.formData();
		const teamId = String(data.get('teamId') ?? '');
		const { user } = await requireTeamRole(event, teamId, 'fab-profile.write');
		const values = Object.fromEntries(['name', ...lengthKeys, ...legendKeys, ...processKeys].map((k) => [k, String(data.get(k) ?? '')]));
		const num = (t: string) => (t.trim() === '' ? undefined : Number(t));
		// Lengths: a bare number is in the unit the form was shown in (the person's), "8 mil" or "0.2 mm" say their own.
		const posted = data.get('lengthUnit');
		const unit = isLengthUnit(posted) ? posted : (await findDisplayUnits(user.id)).length;
		const lengths = Object.fromEntries([...lengthKeys, ...legendKeys].map((k) => [k, values[k].trim() === '' ? undefined : parseLengthMm(values[k], unit)]));
		const raw = {
			name: values.name,
			...Object.fromEntries(lengthKeys.map((k) => [k, lengths[k] === undefined ? undefined : lengths[k].ok ? lengths[k].value : Number.NaN])),
			...Object.fromEntries(legendKeys.flatMap((k) => (lengths[k] === undefined ? [] : [[k, lengths[k].ok ? lengths[k].value : Number.NaN]]))),
			maxCopperLayers: num(values.maxCopperLayers),
			boardThicknessTolerancePercent: num(values.boardThicknessTolerancePercent),
			mixedCores: values.mixedCores === 'on',
			...(values.finish ? { finish: values.finish } : {})
		};
		try {
			const added = await addFabProfile(getDb(), { teamId, userId: user.id, raw });
			return { added: added.profile.name };
		} catch (err) {
			if (err instanceof InputError) {
				// text the parser refused says why, then the range the schema allows
				const message = (path: string, schemaMessage: string) => {
					const parsed = lengths[path];
					return parsed && !parsed.ok ? `${parsed.message}; ${schemaMessage.replace(/^must be a finite number; /, '')}` : schemaMessage;
				};
				return formFail(400, { action: 'add', message: 'Please correct the marked fields.', fieldErrors: err.issues.map((i) => ({ field: i.path, message: message(i.path, i.message) })), values });
			}
			throw err;
		}
	}
};
