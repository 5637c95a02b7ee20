import { describe, expect, it } from "vitest";
import { cspHash } from "../../../src/render/page3d/build.js";
import { renderViewHtml } from "../../../src/render/page3d/html.js";
import { PAGE_CSS } from "../../../src/render/page3d/styles.js";
import { demoScreen, pageData } from "../../support/viewPage.js";

describe("the 3-D page's HTML", () => {
  const outcome = demoScreen();
  const data = pageData(outcome);

  it("keeps a hostile team or pitcher name inside its JSON block (no '</script>' breaks out)", () => {
    const hostile = `</script><script>alert(1)</script><!--`;
    const doc = { ...data, team: hostile };
    const out = renderViewHtml({ data: doc, script: "void 0", css: PAGE_CSS, scriptHash: cspHash("void 0"), styleHash: cspHash(PAGE_CSS) });
    expect(out.match(/<script\b/g)).toHaveLength(2);
    const block = /<script type="application\/json" id="seam-atlas-view-data">([\s\S]*?)<\/script>/.exec(out)?.[1] ?? "";
    expect(JSON.parse(block).team).toBe(hostile);
  });
});
