import { loadBundle } from "./tests/bundle/harness";
import { benchStability } from "./bench/engine";
const bundle = loadBundle();
for (const r of benchStability((n) => bundle.functions.get(n) as any)) console.log(r.name.padEnd(72), r.figure.padEnd(40), r.target, r.met);
