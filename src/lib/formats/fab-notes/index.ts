// Fab notes: plain text from templates/fab-notes.ts.
export { buildFabNotes, fillTemplate, OUNCE_COPPER_THICKNESS_UM, type FabNotesExtras, type FabNotesWaiver } from './build-fab-notes';
