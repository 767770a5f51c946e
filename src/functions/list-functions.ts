/**
 * Lists for Data Validation and audit trails: REDOX.METALS() and REDOX.ELECTRODES() spill the supported names down
 * one column; REDOX.VERSION() gives the add-in version and the fingerprint of the data it answers from.
 */
import addIn from "../../package.json";
import { dataFileCount, dataFingerprint, getDatabase, getElectrodes } from "../chemistry";
import { CellOutput } from "./cell-values";

/** The metals of the database by symbol, one per row. */
export function metalList(): CellOutput[][] {
  return getDatabase()
    .metals()
    .map((symbol) => [symbol]);
}

/** The reference electrodes by their names (SHE, SCE, AgCl-sat …), one per row. */
export function electrodeList(): CellOutput[][] {
  return getElectrodes()
    .all()
    .map((e) => [e.id]);
}

/** Two rows: the add-in's version, and the data fingerprint with the number of files it covers. */
export function versionTable(): CellOutput[][] {
  return [
    ["add-in", addIn.version],
    ["data", `${dataFingerprint()} (${dataFileCount()} files)`],
  ];
}
