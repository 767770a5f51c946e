/**
 * The worksheet functions the command line evaluates, imported from the same sources the spreadsheet bundle is
 * built from, so a CSV row and a worksheet row give the same answers. Each takes cells or columns (n × 1 ranges)
 * and returns a range of results, with CellError values where the spreadsheet would show an error.
 */
import type { CellInput, CellOutput } from "../functions/cell-values";
import { boundaryFrom, dissolvedAt, regimeAt, speciesAt } from "../functions/stability-functions";
import { toSHEAt } from "../functions/electrode-functions";
import { waterMarginAt } from "../functions/water-functions";
import { dicAt } from "../functions/carbonate-functions";
import { ionicStrengthAt } from "../functions/ionic-strength-functions";

export interface WorksheetFunctions {
  /** REDOX.TOSHE(reading, electrode, [temperature], [pH]) */
  toShe(reading: CellInput, electrode: CellInput, temperature?: CellInput, pH?: CellInput): CellOutput[][];
  /** REDOX.WATERMARGIN(pH, potential, [temperature], [overpotential]) */
  waterMargin(pH: CellInput, potential: CellInput, temperature?: CellInput, overpotential?: CellInput): CellOutput[][];
  /** REDOX.SPECIES(element, pH, potential, [temperature], [activity], [carbonate], [chloride], [sulfur], [phosphate], [ionicStrength]) */
  species(
    element: CellInput,
    pH: CellInput,
    potential: CellInput,
    temperature?: CellInput,
    activity?: CellInput,
    carbonate?: CellInput,
    chloride?: CellInput,
    sulfur?: CellInput,
    phosphate?: CellInput,
    ionicStrength?: CellInput,
  ): CellOutput[][];
  /** REDOX.REGIME(element, pH, potential, [temperature], [activity], [carbonate], [chloride], [sulfur], [phosphate], [ionicStrength]) */
  regime(
    element: CellInput,
    pH: CellInput,
    potential: CellInput,
    temperature?: CellInput,
    activity?: CellInput,
    carbonate?: CellInput,
    chloride?: CellInput,
    sulfur?: CellInput,
    phosphate?: CellInput,
    ionicStrength?: CellInput,
  ): CellOutput[][];
  /** REDOX.BOUNDARY(element, pH, potential, [temperature], [activity], [carbonate], [chloride], [sulfur], [phosphate], [ionicStrength], [direction]) */
  boundary(
    element: CellInput,
    pH: CellInput,
    potential: CellInput,
    temperature?: CellInput,
    activity?: CellInput,
    carbonate?: CellInput,
    chloride?: CellInput,
    sulfur?: CellInput,
    phosphate?: CellInput,
    ionicStrength?: CellInput,
    direction?: CellInput,
  ): CellOutput[][];
  /** REDOX.DISSOLVED(element, pH, potential, [temperature], [carbonate], [chloride], [sulfur], [phosphate], [ionicStrength], [unit]) */
  dissolved(
    element: CellInput,
    pH: CellInput,
    potential: CellInput,
    temperature?: CellInput,
    carbonate?: CellInput,
    chloride?: CellInput,
    sulfur?: CellInput,
    phosphate?: CellInput,
    ionicStrength?: CellInput,
    unit?: CellInput,
  ): CellOutput[][];
  /** REDOX.DIC(alkalinity, pH, [temperature]) */
  dic(alkalinity: CellInput, pH: CellInput, temperature?: CellInput): CellOutput[][];
  /** REDOX.IONICSTRENGTH(value, basis) */
  ionicStrength(value: CellInput, basis: CellInput): CellOutput[][];
}

export const worksheetFunctions: WorksheetFunctions = {
  toShe: toSHEAt,
  waterMargin: waterMarginAt,
  species: speciesAt,
  regime: regimeAt,
  boundary: boundaryFrom,
  dissolved: dissolvedAt,
  dic: dicAt,
  ionicStrength: ionicStrengthAt,
};
