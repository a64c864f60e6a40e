// Worker-thread task for the catalog pool (piscina): computes one reference search or one entry.
// The main thread writes the results, so a killed run loses only what was in flight.
import { computeEntry, computeReference, type ReferenceKey, type ReferenceResult } from "./compute.js";
import { computeGroundEntry } from "./computeGround.js";
import type { CellRequest, Grid } from "./grid.js";
import type { GroundCellRequest } from "./gridHf.js";

export type Task =
  | { kind: "reference"; grid: Grid; key: ReferenceKey; previous: ReferenceResult | null }
  | { kind: "entry"; grid: Grid; cell: CellRequest; reference: ReferenceResult; previous: ReferenceResult | null }
  | { kind: "ground"; grid: Grid; cell: GroundCellRequest };

export default function run(task: Task) {
  if (task.kind === "reference") return computeReference(task.grid, task.key, task.previous);
  return task.kind === "ground" ? computeGroundEntry(task.grid, task.cell) : computeEntry(task.grid, task.cell, task.reference, task.previous);
}
