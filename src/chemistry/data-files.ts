/**
 * The data files bundled with the engine. Add one import and one entry per file in data/species/.
 */
import type { DataFile } from "./database";
import elements from "../../data/elements.json";
import water from "../../data/species/water.json";
import sn from "../../data/species/sn.json";
import co from "../../data/species/co.json";
import mg from "../../data/species/mg.json";
import ti from "../../data/species/ti.json";
import ag from "../../data/species/ag.json";
import cd from "../../data/species/cd.json";
import mo from "../../data/species/mo.json";

export const ELEMENTS_FILE: DataFile = { path: "data/elements.json", content: elements };

export const DATA_FILES: readonly DataFile[] = [
  { path: "data/species/water.json", content: water },
  { path: "data/species/sn.json", content: sn },
  { path: "data/species/co.json", content: co },
  { path: "data/species/mg.json", content: mg },
  { path: "data/species/ti.json", content: ti },
  { path: "data/species/ag.json", content: ag },
  { path: "data/species/cd.json", content: cd },
  { path: "data/species/mo.json", content: mo },
];
