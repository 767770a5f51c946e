/**
 * Table look-ups that user text cannot fool: only a table's own keys count, so "constructor", "__proto__" or
 * "toString" find nothing instead of a property every object inherits.
 */
const hasOwn = Object.prototype.hasOwnProperty;

/** The value stored under `key` in `table` itself, or undefined. */
export function ownEntry<V>(table: Readonly<Record<string, V>>, key: string): V | undefined {
  return hasOwn.call(table, key) ? table[key] : undefined;
}
