/** `seam-atlas landmarks`: the named places on the ball, in the ball frame. */
import type { Argv } from "yargs";
import { textOption } from "./options.js";
import { print } from "./output.js";

export function registerLandmarks(y: Argv): Argv {
  return y.command(
    "landmarks",
    "list the named places on the ball (horseshoe tips, waists, lobe centres, equator crossings)",
    (c) =>
      c
        .option("seam-shape", textOption("seam shape b, 0 < b < 0.5 [default: fitted to a published cover's waist]"))
        .option("json", { type: "boolean", default: false, describe: "print JSON" }),
    async (argv) => {
      const { parseLandmarks, runLandmarks } = await import("../jobs/landmarks.js");
      const result = runLandmarks(parseLandmarks(argv));
      if (argv.json) {
        const { jsonText, landmarksDocument } = await import("../jobs/formats/json.js");
        print(jsonText(landmarksDocument(result)));
      } else {
        const { landmarksText } = await import("../jobs/formats/text.js");
        print(landmarksText(result));
      }
    },
  );
}
