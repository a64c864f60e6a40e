// The shape file of an over-ground entry: the wire as hung (overGround.mountedPointsM, ground at
// z = 0) and the ground, so that `bentwire analyze FILE --band-mhz LO:HI --elevation-window-deg A:B`
// reproduces the entry. Browser-safe (no Node imports): the site's download can use it.
import type { Entry } from "./entrySchema.js";

export function groundShapeFileOf(entry: Entry) {
  const inputs = entry.inputs.overGround;
  if (!inputs || !entry.overGround || !entry.shape) throw new Error(`${entry.id}: not an over-ground entry with a shape`);
  return {
    name: entry.title.slice(0, 200),
    frequencyHz: entry.inputs.frequencyHz,
    wireRadiusM: entry.inputs.wireDiameterM / 2,
    conductor: entry.inputs.conductor,
    segmentsPerWavelength: entry.inputs.segmentsPerWavelength,
    wires: [{ pointsM: entry.overGround.mountedPointsM.map((p) => [p[0], p[1], p[2]]) }],
    feed: { wire: 0, vertex: entry.shape.feedVertex },
    ground: inputs.ground,
  };
}
