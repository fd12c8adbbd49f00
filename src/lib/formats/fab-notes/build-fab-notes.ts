// Fab notes: fills the plain-text template from templates/ with an order checklist, the stack, the laminate that is
// bought, copper, finish, the recorded fab profile's tolerances, drills and cautions; they speak to the board house only.
// Text from users (design name, profile name, waiver reason) goes in on one line with control characters
// removed, and quoted inside our own sentences, so it can never forge a line of the notes.
import { fabNotesTemplate } from '../../../../templates/fab-notes';
import type { Artwork } from '../../artwork';
import type { DesignInput, OrderedLaminate } from '../../schemas/design-input';
import { laminateClassFor, orderedLaminateOf } from '../../schemas/laminate';
import { legendRulesOf, type FabProfile } from '../../schemas/fab-profile';
import type { SizedMaskCover } from '../../rf/mask-cover';
import { replaceControlCharacters, toOneLine } from '../../schemas/plain-text';
import { SOFTWARE_NAME, type ExportMeta } from '../export-meta';

/**
 * Thickness of 1 oz/ft² copper: 1 oz (28.35 g) spread over 1 ft² (929 cm²) at 8.96 g/cm³
 * is 34.8 µm (from memory; the trade rounds it to 35 µm).
 */
export const OUNCE_COPPER_THICKNESS_UM = 34.8;

export interface FabNotesExtras {
	/** File names of the export, listed in the notes' order checklist. */
	readonly fileNames: readonly string[];
	readonly solderMask: boolean;
	/** The fab profile the revision recorded (checked against): named, and the source of every tolerance and the finish. */
	readonly profile: FabProfile;
	/** The design input: the laminate that is bought (never a fitted εr) and whether the stack is explicit. */
	readonly input: DesignInput;
	/** What the sizing assumed of a mask over the patch (maskCoverage "covered"); absent: the patch is bare. */
	readonly maskCover?: SizedMaskCover;
	/** Design-rule violations the team waived for this export; absent for a clean design (the notes are then unchanged). */
	readonly waiver?: FabNotesWaiver;
}

/** A recorded waiver: who decided is in the export record; the fab reads why, and what was waived. */
export interface FabNotesWaiver {
	readonly reason: string;
	/** Name of the fab profile the artwork was checked against. */
	readonly profileName: string;
	/** One sentence per waived violation. */
	readonly violations: readonly string[];
}

/** User text inside one of our sentences: one line, in double quotes (a quote or backslash in it escaped as in JSON). */
export function quoteUserText(text: string): string {
	return JSON.stringify(toOneLine(text));
}

function waiverCautions(w: FabNotesWaiver): string[] {
	const count = `${w.violations.length} design-rule violation${w.violations.length === 1 ? '' : 's'}`;
	return [
		`DESIGN-RULE WAIVER: ${count} against the ${quoteUserText(w.profileName)} profile accepted by the design team. Reason: ${quoteUserText(w.reason)}`,
		...w.violations.map((v) => `Waived: ${v}`)
	];
}

const n = (v: number, digits = 3) => String(Number(v.toFixed(digits)));

/** The mask over the patch: what the sizing assumed of it, and how to keep the boards alike (RF: mask over the patch shifts resonance). */
function coveredMaskAdvice(c: SizedMaskCover): string {
	const said = (assumed: boolean) => (assumed ? 'assumed, not stated by the design' : 'as the design states');
	return [
		'Solder mask: it covers the patch on purpose; openings only as drawn on the mask layers.',
		`   The patch was sized under ${n(c.thicknessMm * 1000, 1)} µm of mask (${said(c.assumed.thickness)}) of εr ${n(c.relativePermittivity, 2)} (${said(c.assumed.relativePermittivity)}):`,
		`   its effective permittivity rises from ${n(c.uncoveredEffectivePermittivity, 4)} to ${n(c.coveredEffectivePermittivity, 4)}, and the resonance moves with it.`,
		'   Mask colour and product (RF advice, common practice, no source): pigments change the mask\'s εr and loss a little;',
		'   use one mask product and colour for every build of this design (green LPI is the most uniform), hold its',
		'   thickness over the patch as even as the process allows, and tell the design team its datasheet εr and thickness.'
	].join('\n');
}

/** Legend lines: the layer, where ink must not go, and anything left out for want of room. */
function legendCautions(artwork: Artwork, profile: FabProfile): string[] {
	const legend = artwork.metadata.legend;
	if (!legend) return [];
	const rules = legendRulesOf(profile);
	return [
		`Legend (silkscreen), top side only, as drawn on the legend layer: ${n(legend.strokeWidthMm)} mm lines, ${n(legend.textHeightMm)} mm text. Print it in the mask colour's usual contrasting ink; never over the patch, the feed or a mask opening (keep ${rules.legendToOpeningMm} mm clear, ${rules.legendToEdgeMm} mm inside the edge). Do not add your own marks or order numbers to the top side.`,
		...(legend.omitted.length ? [`Legend items left out for want of room on the board: ${legend.omitted.join(', ')}.`] : [])
	];
}

/** Mounting holes: non-plated, in their own drill file. */
function mountingHoleCautions(artwork: Artwork): string[] {
	const holes = artwork.drills.filter((d) => d.role === 'mounting');
	if (holes.length === 0) return [];
	return [`Mounting holes: ${holes.length} non-plated (NPTH) hole${holes.length === 1 ? '' : 's'} in the non-plated drill file; do not plate ${holes.length === 1 ? 'it' : 'them'}. Copper is pulled back around each on the planes, as drawn.`];
}

/** A nominal copper weight: µm → the nearest half ounce the trade orders by (at least ½ oz). */
export function copperWeightOf(thicknessUm: number): string {
	const halfOunces = Math.max(1, Math.round((thicknessUm / OUNCE_COPPER_THICKNESS_UM) * 2));
	const oz = halfOunces / 2;
	return `${oz} oz (${n(thicknessUm, 1)} µm finished)`;
}

const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';

/** 5.8e7 → "5.8 × 10⁷" (three significant digits at most). */
export function scientific(value: number): string {
	if (value === 0) return '0';
	const exponent = Math.floor(Math.log10(Math.abs(value)));
	const mantissa = Number((value / 10 ** exponent).toPrecision(3));
	const sup = String(exponent).replace('-', '⁻').replace(/\d/g, (d) => SUPERSCRIPT_DIGITS[Number(d)]);
	return exponent === 0 ? String(mantissa) : `${mantissa} × 10${sup}`;
}

/** Where each copper layer sits: "top side", "inner layer 1", "bottom side". */
function copperPlaceOf(index: number, count: number): string {
	if (index === 0) return 'top side';
	if (index === count - 1) return 'bottom side';
	return `inner layer ${index}`;
}

/** "2 copper layers (top and bottom sides)", "3 copper layers (top side, 1 inner layer, bottom side)". */
export function layerCountWords(copperCount: number): string {
	if (copperCount === 1) return '1 copper layer (top side only)';
	if (copperCount === 2) return '2 copper layers (top and bottom sides)';
	const inner = copperCount - 2;
	return `${copperCount} copper layers (top side, ${inner} inner layer${inner === 1 ? '' : 's'}, bottom side)`;
}

/** εr (with its ±) and tanδ as the laminate states them; nothing it does not state. */
const statedValues = (l: OrderedLaminate) =>
	`εr ${l.relativePermittivity}${l.relativePermittivityTolerance !== undefined ? ` ± ${l.relativePermittivityTolerance}` : ''}${l.lossTangent !== undefined ? `, tanδ ${l.lossTangent}` : ''}`;

/** Replaces every {{key}}; a key without a value is a programming error, not input. */
export function fillTemplate(template: string, values: Readonly<Record<string, string>>): string {
	return template.replace(/\{\{(\w+)\}\}/g, (_, key: string) => {
		if (!(key in values)) throw new Error(`fab-notes template placeholder {{${key}}} has no value`);
		return values[key];
	});
}

export function buildFabNotes(artwork: Artwork, meta: ExportMeta, extras: FabNotesExtras): string {
	const { profile, input } = extras;
	const profileName = quoteUserText(profile.name);
	const stack = artwork.stack;
	const total = stack.reduce((s, l) => s + l.thicknessMm, 0);
	const coppers = stack.filter((l) => l.kind === 'copper');
	const cores = stack.filter((l) => l.kind === 'dielectric' && !l.bonding);
	const films = stack.filter((l) => l.kind === 'dielectric' && l.bonding);
	// Without an explicit stack the one dielectric is the laminate that is bought: its stated values, never a fitted εr.
	const ordered = input.stack ? null : orderedLaminateOf(input);
	const dielectricWords = (l: Extract<Artwork['stack'][number], { kind: 'dielectric' }>) =>
		ordered ? `${statedValues(ordered)} (as the laminate states)` : `εr ${l.relativePermittivity}, tanδ ${l.lossTangent}`;
	let copperIndex = 0;
	const stackTable = stack
		.map((l) =>
			l.kind === 'copper'
				? `   - ${l.id.padEnd(14)} ${'copper'.padEnd(13)} ${n(l.thicknessMm * 1000, 1)} µm   (${copperPlaceOf(copperIndex++, coppers.length)}, layer ${l.layerId})`
				: `   - ${l.id.padEnd(14)} ${(l.bonding ? 'bonding film' : 'core').padEnd(13)} ${n(l.thicknessMm)} mm   ${dielectricWords(l)}`
		)
		.join('\n');

	const laminateLines: string[] = [];
	let laminateChoice: string;
	if (ordered) {
		const core = cores[0];
		const coreMm = core ? n(core.thicknessMm) : '0';
		const stated = statedValues(ordered);
		const className = laminateClassFor(ordered.relativePermittivity).name;
		laminateChoice = ordered.name !== undefined ? `${quoteUserText(ordered.name)}, ${coreMm} mm core` : `no product named (${className}), ${coreMm} mm core`;
		laminateLines.push(
			ordered.name !== undefined
				? `   Order ${quoteUserText(ordered.name)}, ${coreMm} mm core: ${stated}, as its datasheet states.`
				: `   The design names no product: a laminate of the ${className} with ${stated}, ${coreMm} mm core.\n   Confirm the product with the design team before ordering.`,
			'   Build on this laminate (or one the design team approves in writing): the antenna was sized for it,',
			'   and a different material moves its resonance.'
		);
	} else {
		laminateChoice = `${cores.length} core${cores.length === 1 ? '' : 's'}${films.length ? ` and ${films.length} bonding film${films.length === 1 ? '' : 's'}` : ''} as listed in section 2`;
		laminateLines.push(
			`   ${cores.length} core${cores.length === 1 ? '' : 's'}${films.length ? ` and ${films.length} bonding film${films.length === 1 ? '' : 's'}` : ''}, each with the εr, tanδ and thickness listed in section 2;`,
			'   build them in that order (top to bottom). Do not substitute a material without the design team\'s written approval.'
		);
		if (cores.length > 1 && films.length === 0) {
			laminateLines.push(
				`   The stack lists no bonding film between its ${cores.length} cores: before building, state the film you will bond them with`,
				'   (material, εr, thickness), since it adds to the finished thickness; the design team must approve it.'
			);
		}
	}

	const copperUm = coppers.map((l) => l.thicknessMm * 1000);
	const sameCopper = copperUm.every((um) => um === copperUm[0]);
	const copperPerLayer = sameCopper && copperUm.length
		? `${copperWeightOf(copperUm[0])} on each of the ${copperUm.length} layers`
		: coppers.map((l, i) => `${copperPlaceOf(i, coppers.length)} ${copperWeightOf(copperUm[i])}`).join('; ');
	const copperTable = coppers.map((l, i) => `   - ${copperPlaceOf(i, coppers.length).padEnd(14)} ${copperWeightOf(copperUm[i])}, layer ${l.layerId}`).join('\n');

	const byDiameter = new Map<string, { plated: boolean; count: number }>();
	for (const d of artwork.drills) {
		const key = `${d.plated ? 'PTH ' : 'NPTH'} ${n(d.diameterMm)}`;
		byDiameter.set(key, { plated: d.plated, count: (byDiameter.get(key)?.count ?? 0) + 1 });
	}
	const drillTable = byDiameter.size
		? [...byDiameter.entries()]
				.sort(([a], [b]) => a.localeCompare(b))
				.map(([key, v]) => `   - ${key} mm finished hole, ${v.count} hole(s)${v.plated ? `, plated through, ± ${profile.platedDrillToleranceMm} mm` : `, ± ${profile.nonPlatedDrillToleranceMm} mm`}`)
				.join('\n')
		: '   None: this design has no holes.';
	const probe = artwork.metadata.probe;
	const probeLine = !probe
		? ''
		: probe.model === 'plated-barrel'
			? `\n   Probe hole: plated barrel, at least ${probe.platingThicknessUm} µm copper on the hole wall, finished at ${n(probe.drillDiameterMm)} mm.`
			: `\n   Probe hole: finished at ${n(probe.drillDiameterMm)} mm; a solid connector pin is soldered through it after fabrication.`;

	const launchLine = launchNote(artwork, profile);

	const toleranceTable = [
		`Etched copper edges: ± ${profile.etchToleranceMm} mm`,
		`Narrowest track and gap: ${profile.minTraceWidthMm} mm and ${profile.minSpacingMm} mm`,
		`Narrowest slot cut in copper: ${profile.minSlotWidthMm} mm`,
		`Smallest finished hole: ${profile.minDrillMm} mm; annular ring at least ${profile.minAnnularRingMm} mm`,
		`Hole diameter: plated ± ${profile.platedDrillToleranceMm} mm, non-plated ± ${profile.nonPlatedDrillToleranceMm} mm`,
		`Copper to the routed edge: at least ${profile.copperToEdgeMm} mm`,
		`Finished thickness: ± ${profile.boardThicknessTolerancePercent} %`
	]
		.map((line) => `   - ${line}`)
		.join('\n');

	const cautions = [
		'Do not scale, mirror or rotate the artwork; top copper is viewed from the top.',
		`Hold etched copper edges within ± ${profile.etchToleranceMm} mm on the patch and feed; report any over-etch.`,
		'Do not add solder mask, silkscreen or copper over the patch and feed unless the mask layers say so.',
		...legendCautions(artwork, profile),
		...mountingHoleCautions(artwork),
		...(extras.waiver ? waiverCautions(extras.waiver) : [])
	]
		.map((c) => `   - ${c}`)
		.join('\n');

	// A fitted εr (a retune's apparent value) is the design team's model, printed apart and never as an order.
	const fitted = ordered && input.substrate.relativePermittivity !== ordered.relativePermittivity ? input.substrate.relativePermittivity : null;
	const modelValues =
		fitted === null
			? ''
			: [
					'',
					'9. MODEL VALUES (for the design team; not an order instruction)',
					`   The sizing of this revision uses εr ${Number(fitted.toPrecision(3))}, a model value fitted to a measured board: it describes`,
					'   how that board behaved, not a material to order. Build on the laminate named in section 3.',
					`   Copper conductivity in the model: ${scientific(input.substrate.copperConductivitySPerM)} S/m.`,
					''
				].join('\n');

	return fillTemplate(fabNotesTemplate, {
		// the title line: control characters become spaces, nothing else changes
		designName: replaceControlCharacters(meta.designName),
		revisionLabel: meta.revisionLabel,
		revisionDate: meta.revisionDate,
		software: `${SOFTWARE_NAME} ${meta.softwareVersion}`,
		profileName,
		// 0.01 mm: the routed outline is not held any closer
		boardWidthMm: n(artwork.board.widthMm, 2),
		boardLengthMm: n(artwork.board.lengthMm, 2),
		layerCount: layerCountWords(coppers.length),
		totalThicknessMm: n(total, 2),
		thicknessTolerancePercent: String(profile.boardThicknessTolerancePercent),
		thicknessToleranceMm: n((total * profile.boardThicknessTolerancePercent) / 100, 2),
		copperPerLayer,
		finish: profile.finish,
		maskChoice: extras.solderMask ? (extras.maskCover ? 'yes, over the patch too; openings as drawn on the mask layers' : 'yes, openings as drawn on the mask layers') : 'none',
		laminateChoice,
		fileCount: String(extras.fileNames.length),
		fileList: extras.fileNames.map((f) => `       - ${f}`).join('\n'),
		shape: artwork.metadata.shape,
		feedKind: artwork.metadata.feedKind,
		frequencyGhz: n(artwork.metadata.frequencyHz / 1e9, 4),
		stackTable,
		laminate: laminateLines.join('\n'),
		copperSides: `${layerCountWords(coppers.length)}.`,
		copperTable,
		maskAdvice: extras.maskCover
			? coveredMaskAdvice(extras.maskCover)
			: extras.solderMask
			? 'Solder mask: openings as drawn on the mask layers; the antenna copper stays bare.'
			: 'No solder mask: leave the outer copper bare (mask over the patch would shift its resonance).',
		toleranceTable,
		drillTable: drillTable + probeLine + launchLine,
		cautions,
		modelValues
	});
}

/** The connector launch for the board house (empty without one): where its pads and holes are and what the gap must hold. */
function launchNote(artwork: Artwork, profile: FabProfile): string {
	const launch = artwork.metadata.launch;
	if (!launch) return '';
	if (launch.kind === 'edge') {
		return [
			'',
			`   Connector launch at the bottom board edge (y = 0): the ${n(launch.signalWidthMm)} mm line and two top ground pads ${n(launch.groundWidthMm)} mm wide`,
			`   run ${n(launch.lengthMm)} mm in from the edge, flush with it by design, ${n(launch.gapMm)} mm from the line on each side; ${launch.viaCount} plated`,
			`   vias of ${n(launch.viaDrillMm)} mm tie the pads to the bottom ground. Hold that gap within ± ${profile.etchToleranceMm} mm: it sets the launch impedance.`
		].join('\n');
	}
	const [x, y] = launch.center;
	return launch.mount === 'pad'
		? `\n   Connector launch on the bottom side: a ${n(launch.padSideMm ?? 0)} mm square ground pad centred on the probe hole at (${n(x)}, ${n(y)}), the ${n(launch.antiPadDiameterMm)} mm anti-pad cleared in it.`
		: `\n   Connector launch on the bottom side: four plated ${n(launch.flangeDrillMm ?? 0)} mm flange holes on a ${n(launch.flangeSpacingMm ?? 0)} mm square centred on the probe hole at (${n(x)}, ${n(y)}); ${n(launch.antiPadDiameterMm)} mm anti-pad around the pin.`;
}
