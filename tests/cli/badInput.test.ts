/**
 * Bad input, one table. Every case runs the built command line in a fresh
 * temporary folder and checks the rule of the README's "Bad input": exit status 2,
 * exactly one line on stderr naming the value and what is expected, no stack
 * trace, and nothing written or replaced (the folder's names, bytes, modes and
 * modification times are the same afterwards, and no temporary file is left).
 * Each case names the source of the rule it checks beside it.
 */
import { spawnSync } from "node:child_process";
import { linkSync, lstatSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, readlinkSync, symlinkSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { ROOT, runCli } from "../support/cli.js";

const SINKER = ["--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--gyro", "10", "--want", "arm"];
/** One pitch, one field a line (line 1 "{", line 2 "name", ... line 6 "tilt"). */
const PITCH = '{\n  "name": "sinker",\n  "hand": "right",\n  "speedMph": 92,\n  "spinRpm": 2150,\n  "tilt": "1:45"\n}\n';
const CSV_HEADER = "pitcher,pitch,hand,speed_mph,spin_rpm,tilt,move_arm_in,move_up_in";
const CSV = `${CSV_HEADER}\nA,sinker,right,92,2150,1:45,16.5,12.5\n`;

interface BadCase {
  /** What is wrong, in words (the test's name). */
  readonly what: string;
  /** Where the rule comes from. */
  readonly source: string;
  /** Files made in the case's folder first: name to content. */
  readonly files?: Readonly<Record<string, string | Uint8Array>>;
  /** Anything else the case needs in its folder (links, folders). */
  readonly setup?: (dir: string) => void;
  /** The arguments; an argument starting "@/" is a path in the case's folder. */
  readonly args: readonly string[];
  /** The one line's words after "seam-atlas: ". */
  readonly words: RegExp;
}

const CASES: BadCase[] = [
  // where output goes
  { what: "--out with an empty path", source: "POSIX path resolution: an empty pathname names no file (ENOENT)", args: ["measure", "--axis", "waist-A", "--out", ""], words: /^--out "": the path is empty; expected a file path, or - for standard output$/ },
  { what: "--out naming a folder", source: "POSIX rename(2): a file cannot replace a directory (EISDIR)", setup: (d) => mkdirSync(join(d, "folder")), args: ["measure", "--axis", "waist-A", "--out", "@/folder"], words: /^--out ".*\/folder" is a folder; expected a file path$/ },
  { what: "--out ending in / for a folder that does not exist", source: "POSIX path resolution: a trailing slash names a directory", args: ["measure", "--axis", "waist-A", "--out", "@/new/"], words: /^--out ".*\/new\/" names a folder; expected a file path$/ },
  { what: "--out through a file as if it were a folder", source: "POSIX ENOTDIR", files: { f: "a file" }, args: ["measure", "--axis", "waist-A", "--out", "@/f/x.json"], words: /^--out ".*\/f\/x\.json": a part of the path is a file, not a folder/ },
  { what: "an output under /proc, before the 6-pitch atlas is computed", source: "Linux proc(5): no new entries can be made under /proc", args: ["atlas", "--demo", "--out", "/proc/seam-atlas-no/atlas.pdf"], words: /^--out "\/proc\/seam-atlas-no\/atlas\.pdf": cannot create the folder "\/proc\/seam-atlas-no": no such file or folder$/ },
  { what: "a folder that takes no new files even for root, before the 6-pitch atlas is computed", source: "Linux sysfs(5): no regular files are created under /sys", args: ["atlas", "--demo", "--out", "/sys/kernel/seam-atlas.pdf"], words: /^--out "\/sys\/kernel\/seam-atlas\.pdf": cannot write into the folder "\/sys\/kernel": (permission denied|operation not permitted|the file system is read-only)$/ },
  { what: "a full disk (measure)", source: "Linux full(4): every write to /dev/full fails with ENOSPC", args: ["measure", "--axis", "waist-A", "--out", "/dev/full"], words: /^cannot write "\/dev\/full": no space left on device$/ },
  { what: "a full disk (explain batch, streamed)", source: "Linux full(4)", files: { "s.csv": CSV }, args: ["explain", "--csv-in", "@/s.csv", "--out", "/dev/full", "--grid", "15"], words: /^cannot write "\/dev\/full": no space left on device$/ },
  { what: "a loop of symbolic links as --out", source: "POSIX ELOOP", setup: (d) => (symlinkSync("b", join(d, "a")), symlinkSync("a", join(d, "b"))), args: ["measure", "--axis", "waist-A", "--out", "@/a"], words: /^--out ".*\/a": too many levels of symbolic links$/ },
  { what: "screen --pitch p.json --out p.json (the output is the input)", source: "README, Where output goes: no output replaces an input of the run", files: { "p.json": PITCH }, args: ["screen", "--pitch", "@/p.json", "--out", "@/p.json", "--grid", "10"], words: /^--out ".*\/p\.json" is the same file as the input --pitch ".*\/p\.json"; expected a different output file$/ },
  { what: "--out a hard link to the pitch file", source: "POSIX link(2): two names, one inode (same st_dev and st_ino)", files: { "p.json": PITCH }, setup: (d) => linkSync(join(d, "p.json"), join(d, "q.json")), args: ["screen", "--pitch", "@/p.json", "--out", "@/q.json", "--grid", "10"], words: /^--out ".*\/q\.json" is the same file as the input --pitch/ },
  { what: "explain --csv-in s.csv --out s.csv", source: "README, Where output goes", files: { "s.csv": CSV }, args: ["explain", "--csv-in", "@/s.csv", "--out", "@/s.csv"], words: /^--out ".*\/s\.csv" is the same file as the input --csv-in ".*\/s\.csv"; expected a different output file$/ },
  { what: "--out a.json --map a.json (two outputs, one file)", source: "README, Where output goes: each output its own file", args: ["screen", ...SINKER, "--grid", "10", "--out", "@/a.json", "--map", "@/a.json"], words: /^--map ".*\/a\.json" is the same file as --out ".*\/a\.json"; expected a different file for each output$/ },
  { what: "--out - and --map - (two outputs on standard output)", source: "POSIX: one standard output per process", args: ["screen", ...SINKER, "--grid", "10", "--out", "-", "--map", "-"], words: /^--map "-" and --out "-" both write to standard output; expected at most one output on standard output$/ },
  { what: "screen --csv --out x.json", source: "IANA media types: .json is application/json; --out with --csv writes CSV", args: ["screen", ...SINKER, "--grid", "10", "--csv", "--out", "@/x.json"], words: /^--out ".*\/x\.json": the extension \.json names json, but this output is csv; expected a name ending in \.csv$/ },
  { what: "card --svg --out c.pdf (an extension that contradicts the format)", source: "IANA media types: .pdf is application/pdf, .svg is image/svg+xml", args: ["card", ...SINKER, "--svg", "--out", "@/c.pdf"], words: /^--out ".*\/c\.pdf": the extension \.pdf names pdf, but this output is svg; expected a name ending in \.svg$/ },
  { what: "explain --format json --out x.csv", source: "IANA media types: .csv is text/csv (RFC 4180 sec. 3)", files: { "s.csv": CSV }, args: ["explain", "--csv-in", "@/s.csv", "--format", "json", "--out", "@/x.csv"], words: /^--out ".*\/x\.csv": the extension \.csv names csv, but this output is json/ },
  { what: "view --out x.txt", source: "RFC 2854: HTML files end in .html or .htm", args: ["view", "--demo", "--out", "@/x.txt"], words: /^--out ".*\/x\.txt" does not end in \.html/ },
  { what: "--out given twice", source: "README, Bad input: one value per option", args: ["measure", "--axis", "waist-A", "--out", "@/a.json", "--out", "@/b.json"], words: /^--out was given 2 times; expected it once$/ },
  { what: "screen --map maps.json for a staff of 6", source: "README, Screening: with several pitches --map names a folder", args: ["screen", "--demo", "--map", "@/maps.json"], words: /^--map ".*\/maps\.json" is named like a file, but the run has 6 pitches; expected a folder/ },
  { what: "an existing output is not replaced when the input is bad", source: "README, Bad input: no partial or replaced file", files: { "keep.json": "the old contents\n" }, args: ["measure", "--axis", "nowhere", "--out", "@/keep.json"], words: /^--axis "nowhere" is not a landmark; expected one of/ },

  // numbers: decimal only
  { what: "--speed 0x5C (hexadecimal)", source: "ECMA-262 StringToNumber reads 0x; the README's numbers are decimal only", args: ["screen", "--hand", "right", "--speed", "0x5C", "--spin", "2150", "--tilt", "1:45"], words: /^--speed "0x5C" is not a decimal number \(hexadecimal, octal and binary are not read\); expected mph$/ },
  { what: "--speed 1e400", source: "IEEE 754 binary64: the largest finite value is about 1.8e308", args: ["screen", "--hand", "right", "--speed", "1e400", "--spin", "2150", "--tilt", "1:45"], words: /^--speed "1e400" is too large; expected mph$/ },
  { what: "--spin Infinity", source: "IEEE 754: infinity is not a finite number", args: ["screen", "--hand", "right", "--speed", "92", "--spin", "Infinity", "--tilt", "1:45"], words: /^--spin "Infinity" is not a number; expected rpm$/ },
  { what: "--axis NaN,0,0 (not taken for a landmark name)", source: "IEEE 754: NaN is not a number", args: ["measure", "--axis", "NaN,0,0"], words: /^--axis "NaN,0,0": part 1 "NaN" is not a number; expected three decimal numbers X,Y,Z/ },
  { what: "--axis -30N,40E (a sign and a hemisphere letter)", source: "ISO 6709: a hemisphere letter N or S gives the side", args: ["measure", "--axis", "-30N,40E"], words: /^--axis "-30N,40E": the latitude -30N has a sign; expected the letter alone to give the side \(S for south, W for west\), as in 30S,40E$/ },
  { what: "a hexadecimal number in a pitch file", source: "RFC 8259 sec. 6 (numbers are decimal digits)", files: { "p.json": PITCH.replace("92", "0x5C") }, args: ["screen", "--pitch", "@/p.json"], words: /^--pitch ".*\/p\.json" line 4: "0x5C" is not a JSON number; expected digits with an optional fraction and exponent/ },
  { what: "1e400 in a pitch file", source: "IEEE 754 binary64: the largest finite value is about 1.8e308", files: { "p.json": PITCH.replace("2150", "1e400") }, args: ["screen", "--pitch", "@/p.json"], words: /^--pitch ".*\/p\.json" line 5: 1e400 is too large; expected a number below 1\.8e308 in magnitude$/ },

  // JSON files: strict
  { what: "a key given twice in a pitch file", source: "RFC 8259 sec. 4 (names should be unique; we refuse duplicates)", files: { "p.json": '{\n  "name": "sinker",\n  "speedMph": 92,\n  "speedMph": 94,\n  "hand": "right"\n}\n' }, args: ["screen", "--pitch", "@/p.json"], words: /^--pitch ".*\/p\.json" line 4: the key "speedMph" appears again \(first on line 3\); expected each key once in an object$/ },
  { what: "a __proto__ key in a pitch file", source: "ECMA-262 sec. B.3.1 (__proto__ in object literals sets the prototype)", files: { "p.json": '{\n  "name": "sinker",\n  "__proto__": { "hand": "right" }\n}\n' }, args: ["screen", "--pitch", "@/p.json"], words: /^--pitch ".*\/p\.json" line 3: the key "__proto__" is not allowed; expected a field name$/ },
  { what: "a byte that is not UTF-8 in a pitch file", source: "The Unicode Standard, Table 3-7 (0xFF never appears in UTF-8); RFC 8259 sec. 8.1", files: { "p.json": Buffer.concat([Buffer.from('{\n  "name": "sinker",\n  "hand": "right",\n  "pitcher": "'), Buffer.from([0xff]), Buffer.from('"\n}\n')]) }, args: ["screen", "--pitch", "@/p.json"], words: /^--pitch ".*\/p\.json" line 4: byte FF is not valid UTF-8; expected a file saved as UTF-8 text$/ },
  { what: "a NUL byte in a pitch file", source: "RFC 8259 sec. 7 (control characters in strings must be escaped)", files: { "p.json": '{\n  "name": "sinker",\n  "hand": "right",\n  "pitcher": "A\u0000B"\n}\n' }, args: ["screen", "--pitch", "@/p.json"], words: /^--pitch ".*\/p\.json" line 4: a NUL character inside a string; expected text without NUL$/ },
  { what: "a pitch file saved as UTF-16", source: "The Unicode Standard, sec. 23.8 (FF FE is the UTF-16LE byte-order mark)", files: { "p.json": Buffer.from(`\ufeff${PITCH}`, "utf16le") }, args: ["screen", "--pitch", "@/p.json"], words: /^--pitch ".*\/p\.json" line 1: the file starts with the UTF-16 byte-order mark FF FE, so it is saved as UTF-16; expected a file saved as UTF-8 text$/ },
  { what: "a byte-order mark inside a pitch file's tilt", source: "The Unicode Standard, sec. 23.8 (U+FEFF inside text is an invisible no-break)", files: { "p.json": PITCH.replace('"1:45"', '"\ufeff1:45"') }, args: ["screen", "--pitch", "@/p.json"], words: /^--pitch ".*\/p\.json" line 6 \(tilt\): "tilt" "\\ufeff1:45" holds a byte-order mark \(U\+FEFF, invisible\); expected the text without it$/ },
  { what: "a pitch file that is a folder", source: "POSIX read(2) on a directory fails with EISDIR", setup: (d) => mkdirSync(join(d, "p.json")), args: ["screen", "--pitch", "@/p.json"], words: /^--pitch ".*\/p\.json": cannot read the file: it is a folder; expected a pitch file \(JSON\)$/ },

  // values and messages
  { what: "card --candidate 99 (named as typed)", source: "README, Bad input: the message names the option given", args: ["card", ...SINKER, "--candidate", "99"], words: /^--candidate 99 is out of range; expected 1 to 50$/ },
  { what: "card --candidate 2 --reference two-seam", source: "README, Cards: one of the two", args: ["card", ...SINKER, "--candidate", "2", "--reference", "two-seam"], words: /^give --candidate N or --reference four-seam\|two-seam, not both$/ },
  { what: "the command scren", source: "Levenshtein edit distance 1 from screen", args: ["scren", "--demo"], words: /^unknown command "scren"; did you mean screen\?$/ },
  { what: "an option no command has", source: "README, Bad input", args: ["measure", "--axis", "waist-A", "--spin-rate", "2000"], words: /^unknown option --spin-rate for measure; see seam-atlas measure --help$/ },
  { what: "a byte-order mark before a --tilt value", source: "The Unicode Standard, sec. 23.8 (U+FEFF)", args: ["screen", "--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "\ufeff1:45"], words: /^--tilt "\\ufeff1:45" holds a byte-order mark \(U\+FEFF, invisible\); expected the value without it$/ },
  { what: "measure --demo with --gyro (a flag the mode ignores)", source: "README, Bad input: a flag a mode ignores is an error", args: ["measure", "--demo", "--gyro", "5"], words: /^--demo measures the demo's own gyro angles; leave out --gyro "5"$/ },
  { what: "explain for one pitch with --on-bad-row (a batch flag)", source: "README, Bad input: a flag a mode ignores is an error", args: ["explain", ...SINKER, "--move-arm", "16", "--move-up", "12", "--on-bad-row", "stop"], words: /^--on-bad-row goes with --csv-in FILE \(a batch\); leave it out for one pitch$/ },
  { what: "pitch flags beside --csv-in", source: "README, Bad input: a flag a mode ignores is an error", files: { "s.csv": CSV }, args: ["explain", "--csv-in", "@/s.csv", "--out", "@/r.csv", "--speed", "92"], words: /^--speed cannot be combined with --csv-in; the CSV gives every pitch and its movement$/ },
  { what: "--json and --csv together", source: "POSIX: one standard output per process", args: ["screen", ...SINKER, "--json", "--csv"], words: /^give --json or --csv, not both$/ },

  // explain's CSV
  { what: "--csv-in naming a folder", source: "POSIX read(2) on a directory fails with EISDIR", setup: (d) => mkdirSync(join(d, "in")), args: ["explain", "--csv-in", "@/in", "--out", "@/r.csv"], words: /^--csv-in ".*\/in" is a folder; expected a CSV file$/ },
  { what: "--csv-in a file that does not exist", source: "POSIX open(2), ENOENT", args: ["explain", "--csv-in", "@/none.csv", "--out", "@/r.csv"], words: /^--csv-in ".*\/none\.csv": cannot read the file: no such file or folder; expected a CSV file$/ },
  { what: "explain batch --out naming a folder", source: "POSIX rename(2): a file cannot replace a directory", files: { "s.csv": CSV }, setup: (d) => mkdirSync(join(d, "results")), args: ["explain", "--csv-in", "@/s.csv", "--out", "@/results"], words: /^--out ".*\/results" is a folder; expected a file path$/ },
  { what: "explain batch --out \"\"", source: "POSIX path resolution: an empty pathname names no file", files: { "s.csv": CSV }, args: ["explain", "--csv-in", "@/s.csv", "--out", ""], words: /^--out "": the path is empty; expected a file path, or - for standard output$/ },
  { what: "a quoted header never closed", source: "RFC 4180 sec. 2 rules 5-7 (a quoted field ends with a quote)", files: { "s.csv": `"pitcher,pitch,hand\nA,sinker,right\n` }, args: ["explain", "--csv-in", "@/s.csv", "--out", "@/r.csv"], words: /^--csv-in ".*\/s\.csv" line 1: the header cannot be read: a quoted cell is not closed before the end of the file; expected/ },
  { what: "an empty CSV", source: "RFC 4180 sec. 2 rule 3 (the header line names the fields)", files: { "s.csv": "" }, args: ["explain", "--csv-in", "@/s.csv", "--out", "@/r.csv"], words: /^--csv-in ".*\/s\.csv": the file is empty; expected a header line with column names$/ },
  { what: "a NUL byte in the CSV header", source: "RFC 4180 sec. 2 ABNF (TEXTDATA holds no NUL)", files: { "s.csv": `pitcher,pi\u0000tch,hand\nA,sinker,right\n` }, args: ["explain", "--csv-in", "@/s.csv", "--out", "@/r.csv"], words: /^--csv-in ".*\/s\.csv" line 1: the header cannot be read: the record holds a NUL byte; expected text without NUL bytes$/ },
  { what: "a header lacking a column", source: "README, explain's columns", files: { "s.csv": "hand,speed_mph,spin_rpm,tilt,move_arm_in\nright,92,2150,1:45,16\n" }, args: ["explain", "--csv-in", "@/s.csv", "--out", "@/r.csv"], words: /^--csv-in ".*\/s\.csv": the header lacks column "move_up_in" \(or "move_up_cm"\); expected it, or --columns move_up_in=YourHeader$/ },
  { what: "a byte-order mark saved twice into the CSV header (read as ï»¿ and saved again)", source: "Windows-1252 shows the bytes EF BB BF as ï»¿ (The Unicode Standard, sec. 23.8)", files: { "s.csv": Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(`\u00ef\u00bb\u00bf${CSV}`)]) }, args: ["explain", "--csv-in", "@/s.csv", "--out", "@/r.csv"], words: /^--csv-in ".*\/s\.csv": the header has the unknown column "ï»¿pitcher" \(it starts with a byte-order mark that was read as the letters "ï»¿" and saved again; expected the file saved once as UTF-8\); expected the column names without it$/ },
  // the spin direction as trackers give it, and explain's analyst options
  { what: "spin efficiency without a gyro sign (one pitch)", source: "README, For analysts: the gyro sign is never guessed", args: ["explain", "--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--efficiency", "90", "--move-arm", "15", "--move-up", "9"], words: /^--efficiency: spin efficiency 90 % has no gyro sign; expected --gyro-sign pos \(the axis's positive end leans toward the plate\) or neg, or a signed --gyro$/ },
  { what: "spin efficiency without a gyro sign (a pitch file)", source: "README, For analysts: the gyro sign is never guessed", files: { "p.json": '{ "hand": "R", "speedMph": 92, "spinRpm": 2150, "tilt": "1:45", "efficiencyPct": 90 }' }, args: ["screen", "--pitch", "@/p.json"], words: /^--pitch ".*p\.json" line 1 \(efficiencyPct\): spin efficiency 90 % has no gyro sign; expected "gyroSign" pos .* or neg, or a signed "gyroDeg"$/ },
  { what: "a gyro sign that is not one", source: "README, For analysts (pos or neg)", args: ["screen", "--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--efficiency", "90", "--gyro-sign", "up"], words: /^--gyro-sign "up" is not a sign; expected pos or neg$/ },
  { what: "--gyro-sign beside --gyro", source: "README, For analysts: a signed gyro carries its sign", args: ["screen", ...SINKER, "--gyro-sign", "neg"], words: /^--gyro-sign goes with --efficiency \(--gyro carries its own sign\)$/ },
  { what: "--tilt and --tilt-deg together", source: "README, For analysts: one way to give the tilt", args: ["screen", ...SINKER, "--tilt-deg", "52.5"], words: /^give --tilt or --tilt-deg, not both$/ },
  { what: "--tilt-deg of a full turn", source: "README, For analysts: degrees from 0 to below 360", args: ["screen", "--hand", "L", "--speed", "92", "--spin", "2150", "--tilt-deg", "360"], words: /^--tilt-deg 360 is out of range; expected degrees clockwise from 12:00, at least 0 and below 360$/ },
  { what: "a screen option beside --axis in flight", source: "README, Bad input: a flag a mode ignores is an error", args: ["flight", ...SINKER, "--axis", "waist-A", "--rank", "robust"], words: /^--rank goes with --candidate N or --reference \(the screen they come from\); with --axis there is no screen, so leave it out$/ },
  { what: "a flight candidate beyond the screen's --top", source: "README, flight: --candidate N of the screen's list", args: ["flight", ...SINKER, "--candidate", "5", "--top", "3"], words: /^--candidate 5 is beyond --top 3; expected a candidate from 1 to 3$/ },
  { what: "a pitch name that matches two pitches, for a command that takes one", source: "README, pitch files: --pitch-name NAME or PITCHER/NAME", args: ["flight", "--demo", "--pitch-name", "sinker", "--axis", "waist-A"], words: /^--pitch-name "sinker" matches 2 pitches \(Iris Talvela\/sinker, Luz Arrieta\/sinker\); flight takes one: expected PITCHER\/NAME$/ },
  { what: "a staff file whose list of pitchers is misspelled", source: "README, pitch files: a staff is { team, pitchers }", files: { "s.json": '{\n  "team": "x",\n  "pitcher": [ { "name": "A", "hand": "right", "pitches": [] } ]\n}\n' }, args: ["screen", "--pitch", "@/s.json"], words: /^--pitch ".*s\.json" line 3 \(pitcher\): a staff file lists its pitchers under "pitchers", not "pitcher"; expected team, pitchers \(or one pitch's fields alone\)$/ },
  { what: "a switch given a value", source: "README, Bad input: a value the tool cannot read is named, not read as off", args: ["screen", "--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--json=yes"], words: /^--json=yes: --json is a switch; expected --json alone \(or =true, =false\)$/ },
  { what: "air options with a vacuum flight", source: "README, Bad input: a flag a mode ignores is an error", args: ["flight", ...SINKER, "--axis", "waist-A", "--air", "none", "--elevation-ft", "5000"], words: /^--elevation-ft goes with --air standard; --air none flies in a vacuum, so leave it out$/ },
  { what: "a negative speed", source: "README, A pitch: speed 30 to 110 mph", args: ["screen", "--hand", "right", "--speed", "-92", "--spin", "2150", "--tilt", "1:45"], words: /^--speed -92 is out of range; expected 30 to 110 mph$/ },
  { what: "a hand that is not one", source: "README, A pitch: right, left, R or L", args: ["screen", "--hand", "righty", "--speed", "92", "--spin", "2150", "--tilt", "1:45"], words: /^--hand "righty" is not a throwing hand; expected right, left, R or L$/ },
  { what: "a screen of a pitch without spin", source: "README, What it does: seam orientations are read about the spin axis, which spin 0 lacks", args: ["card", "--hand", "right", "--speed", "65", "--spin", "0", "--tilt", "12:00", "--out", "@/c.pdf"], words: /^--spin 0 has no spin axis, so there is no seam orientation to screen; expected a spin above 0 rpm \(a ball without spin flies with flight --axis AXIS --phase DEG\)$/ },
  { what: "--window-ft with the release basis", source: "README, For analysts: the window belongs to the trade basis", args: ["explain", ...SINKER, "--move-arm", "15", "--move-up", "9", "--movement-basis", "release", "--window-ft", "40"], words: /^--window-ft goes with --movement-basis trade/ },
  { what: "an unknown movement basis", source: "README, For analysts", args: ["explain", ...SINKER, "--move-arm", "15", "--move-up", "9", "--movement-basis", "plate"], words: /^--movement-basis "plate" is not one of trade, release$/ },
  { what: "--columns mapping a header the file lacks", source: "README, For analysts: a missing mapped column is named", files: { "s.csv": CSV }, args: ["explain", "--csv-in", "@/s.csv", "--out", "@/r.csv", "--columns", "speed_kmh=Velo"], words: /^--csv-in ".*\/s\.csv": the header lacks column "Velo" \(mapped to speed_kmh by --columns\); expected one of its columns: pitcher, pitch, hand, speed_mph, spin_rpm, tilt, move_arm_in, move_up_in$/ },
  { what: "--columns with a key we do not have", source: "README, For analysts: the column keys", files: { "s.csv": CSV }, args: ["explain", "--csv-in", "@/s.csv", "--out", "@/r.csv", "--columns", "velo=Speed"], words: /^--columns "velo=Speed": "velo" is not a column key; expected one of pitcher, pitch, hand, speed_mph/ },
  { what: "two columns giving the speed in two units", source: "README, For analysts: one column per quantity", files: { "s.csv": "pitcher,hand,speed_mph,Velo,spin_rpm,tilt,move_arm_in,move_up_in\nA,right,92,148,2150,1:45,16,12\n" }, args: ["explain", "--csv-in", "@/s.csv", "--out", "@/r.csv", "--columns", "speed_kmh=Velo"], words: /^--csv-in ".*\/s\.csv": the columns "speed_mph" and "Velo" both give the speed \(as speed_mph and speed_kmh\); expected one of them$/ },
  { what: "--summary with an extension that is no summary format", source: "README, For analysts: the summary is JSON or CSV", files: { "s.csv": CSV }, args: ["explain", "--csv-in", "@/s.csv", "--out", "@/r.csv", "--summary", "@/s.pdf"], words: /^--summary ".*\/s\.pdf": the extension names pdf, but the summary is written as json or csv; expected a name ending in \.json or \.csv$/ },
  { what: "--report that is not a PDF", source: "README, For analysts: the report is a PDF", files: { "s.csv": CSV }, args: ["explain", "--csv-in", "@/s.csv", "--out", "@/r.csv", "--report", "@/r.svg"], words: /^--report ".*\/r\.svg": the extension \.svg names svg, but this output is pdf/ },
  { what: "--summary for one pitch", source: "README, Bad input: a flag a mode ignores is an error", args: ["explain", ...SINKER, "--move-arm", "15", "--move-up", "9", "--summary", "x.json"], words: /^--summary goes with --csv-in FILE \(a batch\); leave it out for one pitch$/ },
  { what: "a CSV saved as UTF-16", source: "The Unicode Standard, sec. 23.8 (FF FE is the UTF-16LE byte-order mark)", files: { "s.csv": Buffer.from(`\ufeff${CSV}`, "utf16le") }, args: ["explain", "--csv-in", "@/s.csv", "--out", "@/r.csv"], words: /^--csv-in ".*\/s\.csv" line 1: the header cannot be read: the file starts with the UTF-16 byte-order mark FF FE, so it is saved as UTF-16; expected a file saved as UTF-8 text$/ },
  // how a run works: the cache and the worker threads (README, the cache; Threads)
  { what: "--cache with an empty path", source: "POSIX path resolution: an empty pathname names no file (ENOENT)", args: ["screen", ...SINKER, "--grid", "10", "--cache", ""], words: /^--cache "": the path is empty; expected a folder for the cache, or none$/ },
  { what: "--cache naming a file", source: "POSIX mkdir(2): a file cannot hold entries (ENOTDIR)", files: { "f.txt": "x" }, args: ["atlas", "--demo", "--grid", "10", "--out", "@/a.pdf", "--cache", "@/f.txt"], words: /^--cache ".*\/f\.txt" is a file; expected a folder for the cache, or none$/ },
  { what: "--cache given twice (view)", source: "README, Bad input: an option given once", args: ["view", "--out", "@/v.html", "--cache", "@/a", "--cache", "@/b"], words: /^--cache was given 2 times; expected it once$/ },
  { what: "--cache naming a file (card)", source: "POSIX mkdir(2): ENOTDIR", files: { "f.txt": "x" }, args: ["card", ...SINKER, "--grid", "10", "--out", "@/c.pdf", "--cache", "@/f.txt"], words: /^--cache ".*\/f\.txt" is a file; expected a folder for the cache, or none$/ },
  { what: "--threads below 0", source: "README, Threads: 0 or more worker threads", args: ["atlas", "--demo", "--grid", "10", "--out", "@/a.pdf", "--threads", "-1"], words: /^--threads -1 is out of range; expected 0 to 64$/ },
  { what: "--threads not a whole number", source: "README, Threads: a whole number of threads", args: ["atlas", "--demo", "--grid", "10", "--out", "@/a.pdf", "--threads", "1.5"], words: /^--threads 1\.5 is not a whole number; expected a whole number from 0 to 64$/ },
  { what: "--threads a word", source: "README, Threads: a number or auto", files: { "s.csv": CSV }, args: ["explain", "--csv-in", "@/s.csv", "--out", "@/r.csv", "--threads", "many"], words: /^--threads "many" is not a decimal number; expected a whole number from 0 to 64$/ },
];

interface Entry {
  readonly kind: string;
  readonly mode: number;
  readonly mtimeMs: number;
  readonly content: string;
}

/** Every entry of `dir` (recursively, dot files included) with its kind, mode, time and bytes or link target. */
function snapshot(dir: string, prefix = ""): Record<string, Entry> {
  const out: Record<string, Entry> = {};
  for (const name of readdirSync(join(dir, prefix))) {
    const rel = join(prefix, name);
    const path = join(dir, rel);
    const st = lstatSync(path);
    const kind = st.isSymbolicLink() ? "link" : st.isDirectory() ? "folder" : st.isFile() ? "file" : "other";
    const content = kind === "link" ? readlinkSync(path) : kind === "file" ? readFileSync(path).toString("base64") : "";
    out[rel] = { kind, mode: st.mode, mtimeMs: st.mtimeMs, content };
    if (kind === "folder") Object.assign(out, snapshot(dir, rel));
  }
  return out;
}

describe("bad input: exit 2, one line naming the value and what is expected, no stack trace, nothing written or replaced", () => {
  for (const c of CASES) {
    it(`${c.what} [${c.source}]`, () => {
      const dir = mkdtempSync(join(tmpdir(), "seam-atlas-bad-"));
      for (const [name, content] of Object.entries(c.files ?? {})) writeFileSync(join(dir, name), content);
      c.setup?.(dir);
      const before = snapshot(dir);
      const r = runCli(c.args.map((a) => (a.startsWith("@/") ? join(dir, a.slice(2)) : a)));
      const lines = r.stderr.split("\n").filter((l) => l !== "");
      expect(r.code).toBe(2); // README, Bad input: exit status 2
      expect(lines).toHaveLength(1); // README, Bad input: one line
      expect(lines[0].startsWith("seam-atlas: ")).toBe(true);
      expect(r.stderr).not.toMatch(/internal error|\n\s+at |\.js:\d+/); // no stack trace
      expect(lines[0].slice("seam-atlas: ".length)).toMatch(c.words);
      // nothing written or replaced, no temporary file left (POSIX stat(2): names, modes, times, bytes)
      expect(snapshot(dir)).toEqual(before);
    });
  }
});

describe("errors that are not the user's are still one line", () => {
  it("a RangeError from the library reaching the command line is one line with exit 2 [README, Bad input]", () => {
    const script = `import { exitWithError } from "./src/cli/errors.ts"; exitWithError(new RangeError("speed 1e9 mph must be from 30 to 110 mph\\n    at somewhere (x.js:1:1)"));`;
    const r = spawnSync(process.execPath, ["--import", "tsx", "--input-type=module", "-e", script], { cwd: ROOT, encoding: "utf8", timeout: 60_000 });
    expect(r.status).toBe(2);
    expect(r.stderr).toBe("seam-atlas: speed 1e9 mph must be from 30 to 110 mph\n");
  });
});
