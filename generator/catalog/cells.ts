// Every cell of a grid, free-space (grid.ts, one reference search per length, pieces and variant) and
// over ground (gridHf.ts, a search per cell), in one list sorted by id for shards and `--only`.
import { entryInputHash } from "./compute.js";
import { groundEntryInputHash } from "./computeGround.js";
import { expandGrid, type CellRequest, type Grid } from "./grid.js";
import { expandOverGround, type GroundCellRequest } from "./gridHf.js";

export type AnyCell = { kind: "free"; id: string; cell: CellRequest } | { kind: "ground"; id: string; cell: GroundCellRequest };

export function allCells(grid: Grid): AnyCell[] {
  const free = expandGrid(grid).map((cell): AnyCell => ({ kind: "free", id: cell.id, cell }));
  const ground = expandOverGround(grid.overGround).map((cell): AnyCell => ({ kind: "ground", id: cell.id, cell }));
  return [...free, ...ground].sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}

export const cellInputHash = (grid: Grid, c: AnyCell): string => (c.kind === "free" ? entryInputHash(grid, c.cell) : groundEntryInputHash(grid, c.cell));
