// The shared memory a sweep's batches write their bytes into: one SharedArrayBuffer, given to each
// worker once (as workerData), cut into slots of a JSON Lines part and a CSV part.

/** The memory and the size of each slot's two parts, bytes. */
export interface SweepSlots { memory: SharedArrayBuffer; jsonlBytes: number; csvBytes: number }

/** The views of slot `i`: its JSON Lines part, then its CSV part. */
export function slotViews(s: SweepSlots, i: number): { jsonl: Uint8Array; csv: Uint8Array } {
  const at = i * (s.jsonlBytes + s.csvBytes);
  return { jsonl: new Uint8Array(s.memory, at, s.jsonlBytes), csv: new Uint8Array(s.memory, at + s.jsonlBytes, s.csvBytes) };
}
