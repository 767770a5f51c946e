import type { InputRow } from "./record-reader";

/**
 * The order the functions see a batch's rows in: grouped by metal, and within a metal by temperature (each in order
 * of first appearance; inside a group the file's order). The engine keeps one element's conditions from row to
 * row, so a group costs one change of element and temperature instead of one per row.
 */
export function groupedOrder(
  rows: readonly InputRow[],
  metalColumn: number | null,
  temperatureColumn: number | null,
): number[] {
  const metals = new Map<string, Map<string, number[]>>();
  for (let i = 0; i < rows.length; i++) {
    const f = rows[i].fields;
    const metal = metalColumn === null ? "" : (f[metalColumn] ?? "").trim();
    const celsius = temperatureColumn === null ? "" : (f[temperatureColumn] ?? "").trim();
    let temperatures = metals.get(metal);
    if (!temperatures) metals.set(metal, (temperatures = new Map()));
    const group = temperatures.get(celsius);
    if (group) group.push(i);
    else temperatures.set(celsius, [i]);
  }
  const order: number[] = [];
  for (const temperatures of metals.values())
    for (const group of temperatures.values()) for (const i of group) order.push(i);
  return order;
}
