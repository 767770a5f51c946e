import { getDatabase } from "./src/chemistry/database";
import { buildLigandSystem } from "./src/chemistry/ligand-system";
import { tracedRegions } from "./src/chemistry/region-tracing";
const db = getDatabase();
const sys = buildLigandSystem(db, "Pb", { celsius: 25, activity: 1e-6 }, { carbonate: 2e-3, chloride: 1e-3, sulfur: 1e-4 });
const t = performance.now();
const r = tracedRegions(db, sys, { pHMin: 0, pHMax: 14, eMin: -1.5, eMax: 2 });
console.log(r.length, "pieces", (performance.now() - t).toFixed(0), "ms", new Set(r.map((x) => x.formula)));
