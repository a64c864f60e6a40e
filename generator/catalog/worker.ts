// Worker-thread task for the catalog pool (piscina): computes one reference search or one entry.
// The main thread writes the results, so a killed run loses only what was in flight.
import { computeEntry, computeReference, type ReferenceKey, type ReferenceResult } from "./compute.js";
import type { CellRequest, Grid } from "./grid.js";

export type Task =
  | { kind: "reference"; grid: Grid; key: ReferenceKey; previous: ReferenceResult | null }
  | { kind: "entry"; grid: Grid; cell: CellRequest; reference: ReferenceResult };

export default function run(task: Task) {
  return task.kind === "reference" ? computeReference(task.grid, task.key, task.previous) : computeEntry(task.grid, task.cell, task.reference);
}
