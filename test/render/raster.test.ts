// The PNG outputs: thumbnails at the requested square size, the share card at 1200 × 630, both
// byte-identical for identical input.
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { shareCardPng, thumbnailPng } from "../../generator/render/index.js";
import { loadCardFonts } from "../../generator/render/shareCardPng.js";
import { okEntries } from "./fixtures.js";

const entry = okEntries()[0];

describe("thumbnailPng", () => {
  it.each([160, 96, 320])("gives a %i px square PNG", async (size) => {
    const meta = await sharp(await thumbnailPng(entry, size)).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(["png", size, size]);
  });

  it("defaults to 160 px and repeats byte for byte", async () => {
    const a = await thumbnailPng(entry), b = await thumbnailPng(entry);
    expect((await sharp(a).metadata()).width).toBe(160);
    expect(a.equals(b)).toBe(true);
  });

  it("rejects a size that is not a sensible whole number", async () => {
    await expect(thumbnailPng(entry, 10.5)).rejects.toThrow(/whole number/);
  });
});

describe("shareCardPng", () => {
  it("gives a 1200 × 630 PNG, the same bytes each time", async () => {
    const a = await shareCardPng(entry), b = await shareCardPng(entry);
    const meta = await sharp(a).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(["png", 1200, 630]);
    expect(a.equals(b)).toBe(true);
  });

  it("gives the same bytes with the fonts loaded once for many cards (as the site build does)", async () => {
    const fonts = loadCardFonts();
    for (const e of okEntries().slice(0, 3)) expect((await shareCardPng(e, fonts)).equals(await shareCardPng(e)), e.id).toBe(true);
  });
});
