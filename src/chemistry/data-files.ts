/**
 * The data files bundled with the engine. Add one import and one entry per file in data/species/.
 */
import type { DataFile } from "./database";
import elements from "../../data/elements.json";
import water from "../../data/species/water.json";
import fe from "../../data/species/fe.json";
import cu from "../../data/species/cu.json";
import zn from "../../data/species/zn.json";
import pb from "../../data/species/pb.json";
import ni from "../../data/species/ni.json";
import cr from "../../data/species/cr.json";
import al from "../../data/species/al.json";
import mn from "../../data/species/mn.json";
import sn from "../../data/species/sn.json";
import co from "../../data/species/co.json";
import mg from "../../data/species/mg.json";
import ti from "../../data/species/ti.json";
import ag from "../../data/species/ag.json";
import cd from "../../data/species/cd.json";
import mo from "../../data/species/mo.json";
import as_ from "../../data/species/as.json";
import se from "../../data/species/se.json";
import sb from "../../data/species/sb.json";
import hg from "../../data/species/hg.json";
import u from "../../data/species/u.json";
import v from "../../data/species/v.json";
import w from "../../data/species/w.json";
import bi from "../../data/species/bi.json";
import au from "../../data/species/au.json";
import pt from "../../data/species/pt.json";
import carbonate from "../../data/species/carbonate.json";
import sulfur from "../../data/species/sulfur.json";
import chloride from "../../data/species/chloride.json";
import phosphate from "../../data/species/phosphate.json";

export const ELEMENTS_FILE: DataFile = { path: "data/elements.json", content: elements };

export const DATA_FILES: readonly DataFile[] = [
  { path: "data/species/water.json", content: water },
  { path: "data/species/fe.json", content: fe },
  { path: "data/species/cu.json", content: cu },
  { path: "data/species/zn.json", content: zn },
  { path: "data/species/pb.json", content: pb },
  { path: "data/species/ni.json", content: ni },
  { path: "data/species/cr.json", content: cr },
  { path: "data/species/al.json", content: al },
  { path: "data/species/mn.json", content: mn },
  { path: "data/species/sn.json", content: sn },
  { path: "data/species/co.json", content: co },
  { path: "data/species/mg.json", content: mg },
  { path: "data/species/ti.json", content: ti },
  { path: "data/species/ag.json", content: ag },
  { path: "data/species/cd.json", content: cd },
  { path: "data/species/mo.json", content: mo },
  { path: "data/species/as.json", content: as_ },
  { path: "data/species/se.json", content: se },
  { path: "data/species/sb.json", content: sb },
  { path: "data/species/hg.json", content: hg },
  { path: "data/species/u.json", content: u },
  { path: "data/species/v.json", content: v },
  { path: "data/species/w.json", content: w },
  { path: "data/species/bi.json", content: bi },
  { path: "data/species/au.json", content: au },
  { path: "data/species/pt.json", content: pt },
  { path: "data/species/carbonate.json", content: carbonate },
  { path: "data/species/sulfur.json", content: sulfur },
  { path: "data/species/chloride.json", content: chloride },
  { path: "data/species/phosphate.json", content: phosphate },
];
