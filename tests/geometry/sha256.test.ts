import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { sha256Hex } from "../../geometry/sha256.js";
import { lcg } from "../support/random.js";

describe("SHA-256 in plain TypeScript (geometry/sha256.ts)", () => {
  it("gives the FIPS 180-2 appendix B test vectors: \"abc\" and the 448-bit message", () => {
    expect(sha256Hex("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    expect(sha256Hex("abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq")).toBe("248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1");
    expect(sha256Hex("")).toBe("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
  });

  it("agrees with Node's crypto module (a reference implementation) on 300 random strings of 0 to 300 characters, UTF-8 included, across block boundaries", () => {
    const rnd = lcg(256);
    for (let k = 0; k < 300; k++) {
      const n = Math.floor(rnd() * 300);
      const text = Array.from({ length: n }, () => String.fromCodePoint(rnd() < 0.9 ? 32 + Math.floor(rnd() * 95) : 0xa0 + Math.floor(rnd() * 0x2000))).join("");
      expect(sha256Hex(text)).toBe(createHash("sha256").update(text, "utf8").digest("hex"));
    }
  });
});
