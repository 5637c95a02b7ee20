/**
 * The atlas's sphere map drawing: its width and its title fix where the cells fall, so
 * the worker that screens a pitch can draw them (render/sphereMapDrawing.ts
 * sphereMapCellsPdf) for the page the atlas paints (render/paper/atlas.ts). A module of
 * its own so that the atlas job can name it without loading the drawing code.
 */
import type { MapCellsOptions } from "../sphereMapDrawing.js";

export const ATLAS_MAP_CELLS: MapCellsOptions = { widthPx: 720, titled: true };
