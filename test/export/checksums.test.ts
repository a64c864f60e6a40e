import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { sha256Listing } from "../../generator/export/index.js";

const hex = (content: string | Uint8Array) => createHash("sha256").update(content).digest("hex");

describe("sha256 listing", () => {
  it("lists node:crypto digests as '<hex>  <name>' lines sorted by name", () => {
    const bytes = new Uint8Array([0, 1, 2, 255]);
    const listing = sha256Listing([
      { name: "z.csv", content: "x,y\r\n" },
      { name: "B.svg", content: "<svg/>" },
      { name: "a.dxf", content: bytes },
      { name: "ünïcode.txt", content: "é" },
    ]);
    expect(listing).toBe(
      `${hex("<svg/>")}  B.svg\n` +
        `${hex(bytes)}  a.dxf\n` +
        `${hex("x,y\r\n")}  z.csv\n` +
        `${hex(Buffer.from("é", "utf8"))}  ünïcode.txt\n`,
    );
  });

  it("knows the digest of the empty string", () => {
    expect(sha256Listing([{ name: "empty", content: "" }])).toBe(
      "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855  empty\n",
    );
  });

  it("gives an empty listing for no files", () => {
    expect(sha256Listing([])).toBe("");
  });

  it("rejects repeated names and names with line breaks", () => {
    expect(() => sha256Listing([{ name: "a", content: "1" }, { name: "a", content: "2" }])).toThrow(
      /entries\[1\]\.name: must be unique/,
    );
    expect(() => sha256Listing([{ name: "a\nb", content: "1" }])).toThrow(/entries\[0\]\.name/);
  });
});
