/**
 * A fingerprint of the bundled data (species, elements, electrodes): FNV-1a, 32 bit, over each file's path and
 * canonical JSON in load order. Two installations answering with the same fingerprint use the same numbers — the
 * data version an audit trail records.
 */
import electrodesData from "../../data/electrodes.json";
import { DATA_FILES, ELEMENTS_FILE } from "./data-files";

const FNV_OFFSET = 0x811c9dc5;
const FNV_PRIME = 0x01000193;

/** FNV-1a over the UTF-16 code units of `text`, continuing from `hash`. */
function fnv1a(text: string, hash: number): number {
  let h = hash;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, FNV_PRIME) >>> 0;
  }
  return h;
}

let cached: string | undefined;

/** "d1f0a2b3": eight hex digits identifying the data files' contents. */
export function dataFingerprint(): string {
  if (cached !== undefined) return cached;
  let hash = FNV_OFFSET;
  const files = [ELEMENTS_FILE, ...DATA_FILES, { path: "data/electrodes.json", content: electrodesData }];
  for (const file of files) hash = fnv1a(`${file.path}\n${JSON.stringify(file.content)}\n`, hash);
  cached = hash.toString(16).padStart(8, "0");
  return cached;
}

/** How many data files the fingerprint covers. */
export function dataFileCount(): number {
  return DATA_FILES.length + 2;
}
