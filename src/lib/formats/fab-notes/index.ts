// Fab notes: plain text from templates/fab-notes.ts.
export { buildFabNotes, copperWeightOf, fillTemplate, layerCountWords, OUNCE_COPPER_THICKNESS_UM, scientific, type FabNotesExtras, type FabNotesWaiver } from './build-fab-notes';
