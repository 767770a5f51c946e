/**
 * src/functions: the worksheet functions (thin adapters over src/chemistry; declarations.ts states them and
 * functions.ts is generated from it). Its public surface, what the pane and the command line call:
 * - stability-functions.ts   SPECIES, REGIME, BOUNDARY, DISSOLVED
 * - assess-functions.ts      ASSESS, and its answers as columns for a batch (what the command line writes)
 * - electrode-functions.ts, water-functions.ts, carbonate-functions.ts, ionic-strength-functions.ts
 * - cell-values.ts, broadcast.ts, ligand-args.ts   cell types, errors and argument reading for other adapters
 */
export { assessColumns, type AssessedColumns } from "./assess-functions";
export { mapCells } from "./broadcast";
export { dicAt } from "./carbonate-functions";
export { CellError, type CellInput, type CellOutput, type CellScalar, isBlank } from "./cell-values";
export { toSHEAt } from "./electrode-functions";
export { type IonicStrengthArgument, ionicStrengthArgument, ionicStrengthAt } from "./ionic-strength-functions";
export { carbonateArg, chlorideArg, phosphateArg, sulfurArg } from "./ligand-args";
export { boundaryFrom, dissolvedAt, regimeAt, speciesAt } from "./stability-functions";
export { waterMarginAt } from "./water-functions";
