/**
 * The solubility chart's numbers through the worksheet function itself: REDOX.DISSOLVED over a range of pH values
 * with the sample's own other arguments — its potential vs SHE, temperature, water totals and ionic strength, the
 * very values sample-answers.ts passed for its row — in µg/L. At the sample's pH the call is that row's call, so the
 * chart shows what the sheet gives, by construction. #N/A (no solid can form) becomes a gap (null).
 */
import { CellError, dissolvedAt, type CellInput, type CellOutput } from "../functions";
import { type DissolvedEvaluator, type PlottedSample } from "../diagram";

/** REDOX.DISSOLVED(metal, pH, the sample's E, T, carbonate, chloride, sulfur, phosphate, I, "ug/L"). */
function dissolvedCells(metal: string, sample: PlottedSample, celsius: number, pH: CellInput): CellOutput[][] {
  const w = sample.ligands ?? {};
  // REDOX.DISSOLVED(element, pH, potential, [temperature], [carbonate], [chloride], [sulfur], [phosphate], [ionicStrength], [unit])
  return dissolvedAt(
    metal,
    pH,
    sample.eSHE,
    sample.celsius ?? celsius,
    w.carbonate ?? "",
    w.chloride ?? "",
    w.sulfur ?? "",
    w.phosphate ?? "",
    sample.ionicStrength ?? "",
    "ug/L",
  );
}

/** The evaluator of the chart model: one call over a 1 × n range of pH values; no number → null. */
export function dissolvedAlongPH(metal: string, sample: PlottedSample, celsius: number): DissolvedEvaluator {
  return (pHs) => dissolvedCells(metal, sample, celsius, [[...pHs]])[0].map((v) => (typeof v === "number" ? v : null));
}

/** The function's message when it refuses the sample's own arguments (not "no solid forms"), else null. */
export function curveProblem(metal: string, sample: PlottedSample, celsius: number): string | null {
  const [[cell]] = dissolvedCells(metal, sample, celsius, sample.pH);
  return cell instanceof CellError && cell.code !== "#N/A" ? cell.message : null;
}
