// The sheet both drawing writers draw.
export { buildDrawingSheet, drawingResolutionMm, overlappingLabels, sheetLabels, DEFAULT_DRAWING_RESOLUTION_MM, FIRST_PASS_CAUTION, SHEET_MARGIN_MM, SHEET_TEXT_MM, type DrawingSheet, type DrawingSheetOptions } from './build-sheet';
