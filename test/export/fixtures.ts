// Sample shapes for the export tests, in metres, flat in the x–y plane with the feed at the origin.
import type { ExportShape } from "../../generator/export/types.js";

/** A small bent dipole for 1296 MHz that fits one A4 sheet. */
export const smallShape: ExportShape = {
  id: "23cm-1.5wl-k2-test",
  title: "23 cm bent wire, test shape",
  frequencyHz: 1_296e6,
  wireDiameterM: 0.0015,
  wires: [
    {
      pointsM: [
        [-0.09, -0.06, 0],
        [-0.085, 0.04, 0],
        [0, 0, 0],
        [0.085, 0.04, 0],
        [0.09, -0.06, 0],
      ],
    },
  ],
  feedPointM: [0, 0, 0],
};

/** A 2 m band design about 3 m of wire long, wider than any sheet. */
export const longShape: ExportShape = {
  id: "2m-1.5wl-k3-max-gain",
  title: "2 m band, 1.5 wavelengths, three bends a side",
  frequencyHz: 145e6,
  wireDiameterM: 0.002,
  wires: [
    {
      pointsM: [
        [-1.1, -0.25, 0],
        [-1.05, 0.2, 0],
        [-0.5, 0.32, 0],
        [0, 0, 0],
        [0.5, 0.32, 0],
        [1.05, 0.2, 0],
        [1.1, -0.25, 0],
      ],
    },
  ],
  feedPointM: [0, 0, 0],
};

/** Two wires meeting at the feed, with awkward coordinates. */
export const twoWireShape: ExportShape = {
  id: "70cm-two-wire",
  title: "Two-wire test",
  frequencyHz: 432.1e6,
  wireDiameterM: 0.001,
  wires: [
    { pointsM: [[0, 0, 0], [0.1234567, 0.0000001, 0], [0.2, -0.1, 0]] },
    { pointsM: [[0, 0, 0], [-0.1234567, -0.0000001, 0], [-0.2, 0.0987654321, 0]] },
  ],
  feedPointM: [0, 0, 0],
};
