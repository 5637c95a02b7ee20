/**
 * The 3-D page built by calling the builder directly (src/render/page3d/build.ts),
 * checked as a file; tests/render/page3d/main.test.ts opens it in a browser.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { buildViewHtml, cspHash } from "../../../src/render/page3d/build.js";
import type { ViewData } from "../../../src/render/page3d/data.js";
import { CAUTION_TEXT } from "../../../src/render/page3d/html.js";
import { buildDemoPage, demoScreen, PAGE_TIMEOUT_MS } from "../../support/viewPage.js";

let data: ViewData;
let html: string;

beforeAll(async () => {
  ({ data, html } = await buildDemoPage());
}, PAGE_TIMEOUT_MS);

describe("the 3-D page as a file", () => {
  it("is one self-contained HTML file: one inline script, one JSON block, nothing loaded by src or href but data:", () => {
    const scripts = [...html.matchAll(/<script\b([^>]*)>/g)].map((m) => m[1].trim());
    expect(scripts).toEqual(['type="application/json" id="seam-atlas-view-data"', ""]);
    const refs = [...html.matchAll(/\b(?:src|href)\s*=\s*"([^"]*)"/g)].map((m) => m[1]);
    expect(refs.every((r) => r.startsWith("data:"))).toBe(true);
    expect(html).not.toMatch(/<link\b(?![^>]*rel="icon")/);
    expect(html).not.toMatch(/@import|url\(\s*['"]?https?:/);
  });

  it("hashes for the Content-Security-Policy as 'sha256-<base64 digest>' (W3C Content Security Policy Level 3): SHA-256 of \"abc\" is ba7816bf...20015ad (FIPS 180-2, appendix B.1)", () => {
    expect(cspHash("abc")).toBe("'sha256-ungWv48Bz+pBQUDeXa4iI7ADYaOWF3qctBD/YfIAFa0='");
    expect(Buffer.from("ungWv48Bz+pBQUDeXa4iI7ADYaOWF3qctBD/YfIAFa0=", "base64").toString("hex")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  });

  it("allows only its own script and style by hash, and no network, in its Content-Security-Policy", () => {
    const csp = /<meta http-equiv="Content-Security-Policy" content="([^"]*)">/.exec(html)?.[1] ?? "";
    const script = /<script>([\s\S]*)<\/script>\s*<\/body>/.exec(html)?.[1] ?? "";
    const style = /<style>([\s\S]*?)<\/style>/.exec(html)?.[1] ?? "";
    expect(csp).toContain("default-src 'none'");
    expect(csp).toContain(`script-src ${cspHash(script)}`);
    expect(csp).toContain(`style-src ${cspHash(style)}`);
    expect(csp).not.toMatch(/https?:|'unsafe-inline'|'unsafe-eval'|\*/);
    expect(script.length).toBeGreaterThan(100_000);
  });

  it("embeds every pitch's screen report exactly as screen builds it, and the pitch's field frame", () => {
    const block = /<script type="application\/json" id="seam-atlas-view-data">([\s\S]*?)<\/script>/.exec(html)?.[1] ?? "";
    const embedded = JSON.parse(block) as ViewData;
    const results = demoScreen().screened;
    expect(embedded.pitches).toHaveLength(6);
    expect(embedded.pitches.map((p) => p.report)).toEqual(JSON.parse(JSON.stringify(results.map((r) => r.report))));
    expect(embedded.pitches[1].frame.pushLine).toEqual(results[1].result.frame.pushLine);
    expect(embedded.team).toMatch(/invented club/);
  });

  it("carries the caution line, and the same data gives the same bytes", async () => {
    expect(html).toContain(CAUTION_TEXT.replace(/'/g, "&#39;"));
    expect(CAUTION_TEXT).toMatch(/can injure/);
    expect(CAUTION_TEXT).toMatch(/gradually/);
    expect(CAUTION_TEXT).toMatch(/never alter/);
    expect(await buildViewHtml(data)).toBe(html);
  }, PAGE_TIMEOUT_MS);

  it("carries the licence of every package bundled into the script (three.js, gl-matrix, svg.js) and of the face it embeds (Noto Sans, SIL Open Font Licence 1.1)", () => {
    expect(html).toContain("/*! Licences of the bundled packages");
    expect(html).toMatch(/\ngl-matrix:\nCopyright \(c\) 2015-\d{4}, Brandon Jones/);
    expect(html).toMatch(/\nthree:\n[^]*?Permission is hereby granted/);
    expect(html).toMatch(/\n@svgdotjs\/svg\.js:\n[^]*?Permission is hereby granted/);
    expect(html).toMatch(/\n@fontsource\/noto-sans:\n[^]*?SIL OPEN FONT LICENSE Version 1\.1/);
  });
});
