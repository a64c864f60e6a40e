// Version of the catalog generator, part of every entry's input hash: bump it when a change to the
// optimizer, analysis or entry layout should make existing entries stale.
export const GENERATOR_VERSION = "bentwire-catalog-4";
