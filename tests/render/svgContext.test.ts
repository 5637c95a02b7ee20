import { describe, expect, it } from "vitest";
import { createSvgCanvas, formatNumber, serializeSvg } from "../../src/render/svgContext.js";
import { xmlProblems } from "../support/svgCheck.js";

describe("svg canvas and deterministic serialisation", () => {
  it("gives every drawing its own document: shapes never leak from one canvas into another", () => {
    const a = createSvgCanvas(10, 10);
    const b = createSvgCanvas(20, 20);
    a.rect().attr({ width: 1, height: 1 });
    b.circle().attr({ r: 2 });
    const sa = serializeSvg(a), sb = serializeSvg(b);
    expect(sa).toContain("<rect");
    expect(sa).not.toContain("<circle");
    expect(sb).toContain("<circle");
    expect(sb).not.toContain("<rect");
    expect(xmlProblems(sa)).toEqual([]);
  });

  it("rounds attribute numbers to the digits asked (opacities to at least 3), leaving colours, URLs, ids and text alone", () => {
    const draw = createSvgCanvas(10, 10);
    draw.rect().attr({ x: 1.23456, y: -0.004, width: 3, height: 2.5e-7, fill: "#1e3a5f", opacity: 0.12345, class: "sa-x2" });
    draw.path().attr({ d: "M1.23456 2.5L-3.14159 4" });
    draw.plain("3.14159 in & more").attr({ x: 0.555555 });
    const s = serializeSvg(draw, 2);
    expect(s).toContain('<rect width="3" height="0" x="1.23" y="0" fill="#1e3a5f" opacity="0.123" class="sa-x2">');
    expect(s).toContain('d="M1.23 2.5L-3.14 4"');
    expect(s).toContain(">3.14159 in &amp; more<");
    expect(s).toContain('xmlns="http://www.w3.org/2000/svg"');
  });

  it("replaces svg.js's process-wide generated ids by ids counted within the drawing, so two renders are identical", () => {
    const render = () => {
      const draw = createSvgCanvas(10, 10);
      const g = draw.gradient("linear", (add) => {
        add.stop({ offset: 0, color: "#000000" });
        add.stop({ offset: 1, color: "#ffffff" });
      });
      draw.rect().attr({ width: 5, height: 5 }).fill(g);
      return serializeSvg(draw, 2, "t");
    };
    const first = render();
    const second = render(); // svg.js's counter has moved on by now
    expect(second).toBe(first);
    expect(first).not.toMatch(/Svgjs/);
    expect(first).toContain('id="t-auto-1"');
    expect(first).toContain('fill="url(#t-auto-1)"');
  });

  it("formats numbers without trailing zeros or negative zero", () => {
    expect(formatNumber(2.5, 2)).toBe("2.5");
    expect(formatNumber(-0.0001, 2)).toBe("0");
    expect(formatNumber(12, 3)).toBe("12");
    expect(formatNumber(-1.23456, 3)).toBe("-1.235");
  });
});
