// Versions that are part of the input hashes. SEARCH_VERSION covers the wavelength-unit reference
// searches (compute.ts referenceHash): bump it when a change to the optimizer or the objective should
// make the committed references stale. GENERATOR_VERSION covers every entry (its reference hash
// included): bump it when a change to the band polish, the analysis or the entry layout should make
// existing entries stale; the references are then reused, so an analysis change recomputes entries
// only. (The search version keeps the name the references were first hashed under.)
export const SEARCH_VERSION = "bentwire-catalog-7";
export const GENERATOR_VERSION = "bentwire-catalog-6";
// The band polish of the free-space entries (compute.ts, computeOffCentre.ts): part of their input
// hash only, so a change there recomputes the free-space entries and not those over the ground.
export const POLISH_VERSION = "bentwire-polish-3";
// The direct-feed band searches (computeOffCentre.ts): part of the free-space direct-feed entries'
// input hash only, so a change there recomputes those entries and leaves the max-gain ones cached.
export const DIRECT_FEED_VERSION = "bentwire-direct-feed-2";
