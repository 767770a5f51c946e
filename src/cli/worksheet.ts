/**
 * The worksheet functions the command line evaluates, imported from the same sources the spreadsheet bundle is
 * built from, so a CSV row and a worksheet row give the same answers. Each takes cells or columns (n × 1 ranges)
 * and returns a range of results, with CellError values where the spreadsheet would show an error. REGIME is not
 * among them: its column is read from SPECIES's (regimes.ts).
 */
import { boundaryFrom, dicAt, dissolvedAt, ionicStrengthAt, speciesAt, toSHEAt, waterMarginAt } from "../functions";

/** The functions by their own signatures (one argument order, written once in src/functions). */
export interface WorksheetFunctions {
  /** REDOX.TOSHE(reading, electrode, [temperature], [pH], [unit]) */
  toShe: typeof toSHEAt;
  /** REDOX.WATERMARGIN(pH, potential, [temperature], [overpotential]) */
  waterMargin: typeof waterMarginAt;
  /** REDOX.SPECIES(element, pH, potential, [temperature], [activity], [carbonate], [chloride], [sulfur], [phosphate], [ionicStrength]) */
  species: typeof speciesAt;
  /** REDOX.BOUNDARY(element, pH, potential, [temperature], [activity], [carbonate], [chloride], [sulfur], [phosphate], [ionicStrength], [direction]) */
  boundary: typeof boundaryFrom;
  /** REDOX.DISSOLVED(element, pH, potential, [temperature], [carbonate], [chloride], [sulfur], [phosphate], [ionicStrength], [unit]) */
  dissolved: typeof dissolvedAt;
  /** REDOX.DIC(alkalinity, pH, [temperature]) */
  dic: typeof dicAt;
  /** REDOX.IONICSTRENGTH(value, basis) */
  ionicStrength: typeof ionicStrengthAt;
}

export const worksheetFunctions: WorksheetFunctions = {
  toShe: toSHEAt,
  waterMargin: waterMarginAt,
  species: speciesAt,
  boundary: boundaryFrom,
  dissolved: dissolvedAt,
  dic: dicAt,
  ionicStrength: ionicStrengthAt,
};
