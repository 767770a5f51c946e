/**
 * The data files bundled with the engine. Add one import and one entry per file in data/species/.
 */
import type { DataFile } from "./database";
import elements from "../../data/elements.json";
import water from "../../data/species/water.json";

export const ELEMENTS_FILE: DataFile = { path: "data/elements.json", content: elements };

export const DATA_FILES: readonly DataFile[] = [
  { path: "data/species/water.json", content: water },
];
