/**
 * Hostile and malformed inputs through every command: no stack trace, no hang, no exit 70 and nothing
 * silently accepted — each case ends with exit code 2 and a message naming the file or the field.
 * Files and option sets are generated in a temporary folder. Most cases run in-process through the
 * command line's own entry point (cliMain with the real Node file layer); only the cases that need a
 * real process (a FIFO, /dev/zero, the process exit code) spawn the command line, with a timeout.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
import {
  chmodSync,
  mkdirSync,
  mkdtempSync,
  readFileSync,
  rmSync,
  statSync,
  symlinkSync,
  truncateSync,
  writeFileSync,
  readdirSync,
} from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { cliMain, nodeIO } from "../../core/cli/main";
import { MAX_INPUT_BYTES, MAX_JSON_DEPTH } from "../../core/scenario/json-text";

const root = join(__dirname, "../..");
const demo = readFileSync(join(root, "demo-scenarios/island-cove.json"), "utf8");
const demoRaw = () => JSON.parse(demo) as Record<string, any>;

let dir = "";
const at = (name: string) => join(dir, name);

interface Outcome {
  code: number;
  out: string;
  err: string;
}

async function cli(...argv: string[]): Promise<Outcome> {
  let out = "";
  let err = "";
  const io = { ...nodeIO(), stdout: (t: string) => void (out += t), stderr: (t: string) => void (err += t) };
  const code = await cliMain(argv, io);
  return { code, out, err };
}

function spawnCli(args: string[], timeout = 60_000) {
  return spawnSync(process.execPath, [join(root, "core/cli/launcher.mjs"), ...args], {
    cwd: dir,
    encoding: "utf8",
    timeout,
  });
}

const NO_STACK = /\n\s+at \S+ \(|Maximum call stack|internal error/;

function expectRefused(o: Outcome, names: RegExp, label: string): void {
  expect(o.code, `${label}: exit code 2 (stderr: ${o.err.slice(0, 300)})`).toBe(2);
  expect(o.err, `${label}: message names the problem`).toMatch(names);
  expect(o.err + o.out, `${label}: no stack trace or internal error`).not.toMatch(NO_STACK);
}

/** How each command is given one input file (outputs go to the temporary folder). */
const COMMANDS: Record<string, (file: string) => string[]> = {
  run: (f) => ["run", f],
  "run --json": (f) => ["run", f, "--json"],
  report: (f) => ["report", f, "--no-3d", "--out", at("hostile-report.html")],
  compare: (f) => ["compare", f],
  sweep: (f) => ["sweep", f, "--vary", "mixingZone.radius=50:100:2", "--workers", "1"],
  design: (f) => ["design", f, "--workers", "1"],
  uncertainty: (f) => ["uncertainty", f, "--runs", "10", "--workers", "1"],
  "check-claim": (f) => ["check-claim", f, "--claimed-dilution", "30"],
};

/** Hostile files: name, bytes, and what the refusal must say. */
const FILES: { name: string; bytes: () => Uint8Array | string; says: RegExp }[] = [
  {
    name: "utf16le-bom.json",
    bytes: () => Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(demo, "utf16le")]),
    says: /UTF-16.*save it as UTF-8/,
  },
  {
    name: "utf16be-bom.json",
    bytes: () => Buffer.concat([Buffer.from([0xfe, 0xff]), Buffer.from(demo, "utf16le").swap16()]),
    says: /UTF-16.*save it as UTF-8/,
  },
  { name: "utf16le-nobom.json", bytes: () => Buffer.from(demo, "utf16le"), says: /UTF-16/ },
  {
    name: "latin1.json",
    bytes: () => Buffer.from(demo.replace("Island cove", "Île cove"), "latin1"),
    says: /not UTF-8/,
  },
  { name: "empty.json", bytes: () => "", says: /is empty/ },
  { name: "spaces.json", bytes: () => " \n\t ", says: /is empty/ },
  {
    name: "deep-arrays.json",
    bytes: () => "[".repeat(10_000) + "]".repeat(10_000),
    says: new RegExp(`nested more than ${MAX_JSON_DEPTH} levels`),
  },
  {
    name: "deep-objects.json",
    bytes: () => '{"a":'.repeat(10_000) + "1" + "}".repeat(10_000),
    says: /nested more than/,
  },
  {
    name: "deep-in-scenario.json",
    bytes: () => demo.replace('"name":', `"deep": ${"[".repeat(5000)}${"]".repeat(5000)}, "name":`),
    says: /nested more than/,
  },
  {
    name: "dup-top.json",
    bytes: () => demo.replace('"name":', '"name": "first", "name":'),
    says: /name: is given twice/,
  },
  {
    name: "dup-nested.json",
    bytes: () => demo.replace('"depth": "18 m"', '"depth": "18 m", "depth": "500 m"'),
    says: /ambient\.depth: is given twice/,
  },
  { name: "not-json.json", bytes: () => "depth: 12 m\n", says: /not valid JSON/ },
  { name: "truncated.json", bytes: () => demo.slice(0, 200), says: /not valid JSON/ },
  { name: "array.json", bytes: () => "[1, 2, 3]", says: /format|scenario|study|object/i },
  { name: "null.json", bytes: () => "null", says: /format|scenario|study|object/i },
  { name: "number.json", bytes: () => "42", says: /format|scenario|study|object/i },
  {
    name: "png.json",
    bytes: () => Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d]),
    says: /UTF-16|not UTF-8|not valid JSON/,
  },
];

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), "brinefield-hostile-"));
  for (const f of FILES) writeFileSync(at(f.name), f.bytes());
  // Over the size cap, without writing 5 MB: a sparse file.
  writeFileSync(at("huge.json"), "{}");
  truncateSync(at("huge.json"), MAX_INPUT_BYTES + 1);
  mkdirSync(at("folder.json"));
  symlinkSync(at("nowhere.json"), at("dangling.json"));
  writeFileSync(at("bom.json"), "\ufeff" + demo);
  writeFileSync(at("mine.json"), demo);
  const study = {
    format: "brinefield-study",
    version: 1,
    name: "bom study",
    base: "bom.json",
    variants: [{ name: "deeper", overrides: { "ambient.depth": "20 m" } }],
  };
  writeFileSync(at("bom-study.json"), "\ufeff" + JSON.stringify(study));
});
afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe("hostile files through every command", () => {
  const extra = [
    { name: "huge.json", says: /larger than the 5 MB Brinefield reads; refused unread/ },
    { name: "folder.json", says: /is a folder/ },
    { name: "missing.json", says: /cannot be read \(no such file\)/ },
    { name: "dangling.json", says: /cannot be read \(no such file\)/ },
  ];
  for (const f of [...FILES, ...extra]) {
    it(`refuses ${f.name} under every command`, async () => {
      for (const [label, args] of Object.entries(COMMANDS)) {
        const o = await cli(...args(at(f.name)));
        expectRefused(o, f.says, `${label} ${f.name}`);
        expect(o.err, `${label} ${f.name}: the file is named`).toContain(f.name);
      }
    });
  }
});

describe("a UTF-8 byte-order mark is accepted by every command that reads the file", () => {
  it("run, report, check-claim, sweep and compare accept the same file with a BOM", async () => {
    for (const args of [
      ["run", at("bom.json"), "--json", "--no-path"],
      ["report", at("bom.json"), "--no-3d", "--out", at("bom-report.html")],
      ["check-claim", at("bom.json"), "--claimed-dilution", "30"],
    ]) {
      const o = await cli(...args);
      expect(o.code, `${args[0]} with a BOM (stderr: ${o.err})`).toBe(0);
    }
    // Commands that start worker threads run as a real process.
    for (const args of [
      ["sweep", "bom.json", "--vary", "mixingZone.radius=50:100:2", "--workers", "1"],
      ["compare", "bom-study.json"],
    ]) {
      const r = spawnCli(args, 120_000);
      expect(r.status, `${args[0]} with a BOM (stderr: ${r.stderr})`).toBe(0);
    }
  }, 240_000);
});

describe("outputs that must not be written", () => {
  it("refuses an output that is the input, keeping the scenario intact", async () => {
    const o = await cli("report", at("mine.json"), "--no-3d", "--out", at("mine.json"));
    expectRefused(o, /mine\.json: is one of this command's input files/, "report --out input");
    expect(readFileSync(at("mine.json"), "utf8"), "scenario untouched").toBe(demo);
    const csv = await cli("report", at("mine.json"), "--no-3d", "--out", at("m.html"), "--csv", at("mine.json"));
    expectRefused(csv, /is one of this command's input files/, "report --csv input");
    expect(readFileSync(at("mine.json"), "utf8"), "scenario untouched by --csv").toBe(demo);
  });
  it("refuses the same file named for two outputs", async () => {
    const o = await cli("report", at("mine.json"), "--no-3d", "--out", at("x.html"), "--csv", at("x.html"));
    expectRefused(o, /named for two outputs/, "two outputs");
  });
  it("refuses a device, a folder and a link to nothing as output, leaving nothing behind", async () => {
    const before = readdirSync(dir).sort();
    for (const [out, says] of [
      ["/dev/full", /is a device/],
      ["/dev/null", /is a device/],
      [at("folder.json"), /is a folder/],
      [at("dangling.json"), /symbolic link to a missing file/],
    ] as const) {
      const o = await cli("report", at("mine.json"), "--no-3d", "--out", out);
      expectRefused(o, says, `--out ${out}`);
    }
    expect(statSync("/dev/null").isCharacterDevice(), "/dev/null still a device").toBe(true);
    expect(readdirSync(dir).sort(), "no temporary files left").toEqual(before);
  });
  it("refuses to write into a folder it may not write, leaving nothing behind", async () => {
    if (process.getuid?.() === 0) return; // root may write anywhere; the permission check is moot
    const locked = at("locked");
    mkdirSync(locked);
    chmodSync(locked, 0o500);
    const o = await cli("report", at("mine.json"), "--no-3d", "--out", join(locked, "r.html"));
    expectRefused(o, /cannot be written \(permission denied\)/, "locked folder");
    expect(readdirSync(locked), "nothing created").toEqual([]);
  });
});

describe("hostile option sets", () => {
  const cases: { args: () => string[]; says: RegExp }[] = [
    {
      args: () => [
        "sweep",
        at("mine.json"),
        "--vary",
        "ambient.depth=10:30:500",
        "--vary",
        "ambient.currentSpeed=0:1:500",
      ],
      says: /250000 points is more than the 40,000/,
    },
    {
      args: () => ["sweep", at("mine.json"), "--vary", "ambient.depth=10:30:501"],
      says: /steps must be a whole number from 1 to 500/,
    },
    { args: () => ["sweep", at("mine.json"), "--vary", "ambient.depth=10:30:0"], says: /steps must be a whole number/ },
    {
      args: () => ["sweep", at("mine.json"), "--vary", "ambient.depth=10:30:2", "--vary", "ambient.depth=10:20:2"],
      says: /varied twice/,
    },
    { args: () => ["sweep", at("mine.json"), "--vary", "nonsense"], says: /must look like path=from:to:steps/ },
    { args: () => ["sweep", at("mine.json"), "--vary", "ambient.depth=Infinity:30:2"], says: /ambient\.depth/ },
    { args: () => ["sweep", at("mine.json"), "--vary", "no.such.path=1:2:2"], says: /no\.such\.path/ },
    { args: () => ["sweep", at("mine.json")], says: /give one or two --vary/ },
    {
      args: () => ["sweep", at("mine.json"), "--vary", "ambient.depth=10:30:2", "--workers", "0"],
      says: /--workers 0 must be/,
    },
    { args: () => ["uncertainty", at("mine.json"), "--runs", "0"], says: /--runs 0 must be a whole number/ },
    {
      args: () => ["uncertainty", at("mine.json"), "--runs", "1e9"],
      says: /--runs 1e9 must be a whole number from 1 to 1000000/,
    },
    { args: () => ["uncertainty", at("mine.json"), "--runs", "abc"], says: /--runs abc/ },
    { args: () => ["uncertainty", at("mine.json"), "--runs", "2.5"], says: /--runs 2.5/ },
    { args: () => ["uncertainty", at("mine.json"), "--seed=-1"], says: /--seed -1/ },
    { args: () => ["uncertainty", at("mine.json"), "--seed", "99999999999"], says: /--seed/ },
    {
      args: () => ["report", at("mine.json"), "--no-3d", "--out", at("r.html"), "--uncertainty", "0"],
      says: /--uncertainty 0/,
    },
    {
      args: () => ["report", at("mine.json"), "--no-3d", "--out", at("r.html"), "--uncertainty", "1000000"],
      says: /--uncertainty/,
    },
    {
      args: () => ["check-claim", at("mine.json"), "--claimed-dilution=-5"],
      says: /--claimed-dilution -5 is not possible: a dilution is at least 1/,
    },
    {
      args: () => ["check-claim", at("mine.json"), "--claimed-dilution", "abc"],
      says: /--claimed-dilution "abc" must be a number/,
    },
    { args: () => ["check-claim", at("mine.json"), "--claimed-dilution", "Infinity"], says: /--claimed-dilution/ },
    { args: () => ["check-claim", at("mine.json")], says: /--claimed-dilution is required/ },
    { args: () => ["check-claim", at("mine.json"), "--claimed-dilution", "30", "--at=-1"], says: /--at -1/ },
    { args: () => ["run", at("mine.json"), "--frobnicate"], says: /frobnicate/ },
    { args: () => ["run"], says: /give exactly one scenario file/ },
    { args: () => ["run", at("mine.json"), at("mine.json")], says: /give exactly one scenario file/ },
    { args: () => ["frobnicate"], says: /unknown command "frobnicate"/ },
    { args: () => ["design", at("mine.json"), "--max-ports", "x"], says: /--max-ports/ },
    { args: () => ["compare"], says: /give one study file/ },
  ];
  for (const c of cases) {
    it(`refuses ${c.args().slice(2).join(" ") || c.args().join(" ")}`, async () => {
      const o = await cli(...c.args());
      expectRefused(o, c.says, c.args().join(" "));
    });
  }
});

describe("prototype keys and non-decimal numbers", () => {
  for (const key of ["constructor", "__proto__", "toString", "hasOwnProperty", "mixingZone.__proto__.radius"]) {
    it(`refuses --vary ${key}=-100:-1:2 as a sweep path (exit 2 naming the path)`, async () => {
      const o = await cli("sweep", at("mine.json"), "--vary", `${key}=-100:-1:2`, "--workers", "1");
      expectRefused(o, new RegExp(`--vary ${key.replace(/[.$]/g, "\\$&")}: is not a path that can be varied`), key);
    });
  }
  it("refuses a prototype key as a study override path (exit 2 naming the path)", async () => {
    const study = {
      format: "brinefield-study",
      version: 1,
      name: "proto study",
      base: "mine.json",
      variants: [{ name: "evil", overrides: { constructor: -100 } }],
    };
    writeFileSync(at("proto-study.json"), JSON.stringify(study));
    expectRefused(await cli("compare", at("proto-study.json")), /constructor/, "study override constructor");
  });
  it("refuses compare --sort __proto__ (exit 2 naming the column)", async () => {
    const o = await cli("compare", at("bom-study.json"), "--sort", "__proto__");
    expectRefused(o, /--sort __proto__: no such column/, "compare --sort __proto__");
  });
  it("refuses a hex number in a sweep range and in the scenario (exit 2 naming the field)", async () => {
    expectRefused(
      await cli("sweep", at("mine.json"), "--vary", "ambient.depth=0x1E:30:2"),
      /--vary ambient\.depth: "from" must be a decimal number/,
      "hex in --vary",
    );
    const raw = demoRaw();
    raw.ambient.depth = "0x1E";
    writeFileSync(at("hex-depth.json"), JSON.stringify(raw));
    expectRefused(
      await cli("run", at("hex-depth.json")),
      /ambient\.depth: "0x1E" must be a decimal number/,
      "hex depth",
    );
  });
  const limitStrings: { edit: (l: Record<string, unknown>) => void; says: RegExp }[] = [
    { edit: (l) => (l.maxIncrease = "1e400"), says: /maxIncrease: "1e400" must be a finite number/ },
    { edit: (l) => (l.maxIncrease = "-2 g/kg"), says: /maxIncrease: "-2 g\/kg" must be a positive increase/ },
    { edit: (l) => (l.maxIncrease = "0 g/kg"), says: /maxIncrease: "0 g\/kg" must be a positive increase/ },
    { edit: (l) => (l.background = "-50 g/kg"), says: /background: "-50 g\/kg" must not be negative/ },
    {
      edit: (l) => ((l.maxConcentration = -5), delete l.maxIncrease),
      says: /maxConcentration: -5 must be a positive concentration/,
    },
  ];
  for (const c of limitStrings) {
    it(`refuses a limit edited as ${c.edit.toString().replace(/^\(l\) => /, "")}, as the numbers are refused`, async () => {
      const raw = demoRaw();
      c.edit(raw.mixingZone.limits[0]);
      const file = at(`limit-${limitStrings.indexOf(c)}.json`);
      writeFileSync(file, JSON.stringify(raw));
      for (const args of [
        ["run", file],
        ["report", file, "--no-3d", "--out", at("limit.html")],
      ]) {
        expectRefused(await cli(...args), c.says, `${args[0]} ${c.says}`);
      }
    });
  }
});

describe("nonsense inside the scenario is refused naming the field", () => {
  const variants: { name: string; edit: (r: Record<string, any>) => void; says: RegExp }[] = [
    { name: "negative diameter", edit: (r) => (r.diffuser.portDiameter = "-0.2 m"), says: /diffuser\.portDiameter/ },
    { name: "depth as text", edit: (r) => (r.ambient.depth = "deep"), says: /ambient\.depth/ },
    { name: "port count zero", edit: (r) => (r.diffuser.portCount = 0), says: /diffuser\.portCount/ },
    { name: "unknown field", edit: (r) => (r.ambient.depthh = 3), says: /ambient\.depthh/ },
    { name: "wrong format", edit: (r) => (r.format = "other"), says: /format/ },
    { name: "newer version", edit: (r) => (r.version = 99), says: /version/ },
    { name: "mixing zone radius negative", edit: (r) => (r.mixingZone.radius = -100), says: /mixingZone\.radius/ },
    { name: "no limits", edit: (r) => (r.mixingZone.limits = []), says: /mixingZone\.limits/ },
    {
      name: "a profile point 500 m below a 18 m seabed",
      edit: (r) => {
        delete r.ambient.salinity;
        delete r.ambient.temperature;
        r.ambient.profile = [
          { depth: 0, salinity: 38.5, temperature: 24 },
          { depth: 500, salinity: 38.6, temperature: 20 },
        ];
      },
      says: /ambient\.profile\.1\.depth: 500 is below the seabed/,
    },
    {
      name: "ports 0.01 m apart and 0.2 m wide",
      edit: (r) => ((r.diffuser.portSpacing = 0.01), (r.diffuser.portDiameter = 0.2)),
      says: /diffuser\.portSpacing: 0\.01 must be at least the port diameter/,
    },
    {
      name: "the same uncertainty path twice",
      edit: (r) =>
        (r.uncertainty = {
          inputs: [
            { path: "ambient.salinity", distribution: "normal", sd: 0.5 },
            { path: "ambient.salinity", distribution: "normal", sd: 1 },
          ],
        }),
      says: /uncertainty\.inputs\.1\.path: "ambient\.salinity" is listed twice/,
    },
  ];
  for (const v of variants) {
    it(`refuses a scenario with ${v.name} under run, check-claim and uncertainty`, async () => {
      const raw = demoRaw();
      v.edit(raw);
      const file = at(`field-${v.name.replace(/\W+/g, "-")}.json`);
      writeFileSync(file, JSON.stringify(raw));
      for (const args of [
        ["run", file],
        ["check-claim", file, "--claimed-dilution", "30"],
        ["uncertainty", file, "--runs", "5", "--workers", "1"],
      ]) {
        expectRefused(await cli(...args), v.says, `${args[0]} ${v.name}`);
      }
    });
  }
});

describe("control characters in user text never reach the terminal", () => {
  it("strips escape sequences and carriage returns from a scenario name in text and JSON output", async () => {
    const raw = demoRaw();
    raw.name = "Evil\u001b[2J\u001b]0;pwned\u0007\rFAKE: meets\u009b31m name";
    writeFileSync(at("escape.json"), JSON.stringify(raw));
    for (const args of [
      ["run", at("escape.json")],
      ["run", at("escape.json"), "--json", "--no-path"],
      ["check-claim", at("escape.json"), "--claimed-dilution", "30"],
    ]) {
      const o = await cli(...args);
      expect(o.code, `${args.join(" ")} runs`).toBe(0);
      // The pattern matches control characters on purpose, to refuse them.
      // eslint-disable-next-line no-control-regex -- the pattern matches control characters on purpose, to find them in the output
      const control = /[\u001b\r\u0007\u0080-\u009f]/;
      expect(o.out + o.err, `${args.join(" ")}: no ESC, CR, BEL or C1 control`).not.toMatch(control);
    }
    const json = JSON.parse((await cli("run", at("escape.json"), "--json", "--no-path")).out);
    expect(json.scenarioName, "JSON keeps the C1 character as an escape, losslessly").toContain("\u009b31m");
  });
  it("strips control characters from messages quoting user input", async () => {
    const o = await cli("run", at("mine.json"), "--\u001b[31mred");
    expect(o.code, "exit").toBe(2);
    // eslint-disable-next-line no-control-regex -- the pattern matches control characters on purpose, to remove or refuse them
    expect(o.err, "no escape in the quoted option").not.toMatch(/\u001b/);
  });
});

describe("cases that need a real process", () => {
  it("refuses a FIFO and /dev/zero without hanging (exit 2)", () => {
    const fifo = at("pipe.json");
    const made = spawnSync("mkfifo", [fifo]);
    const inputs = made.status === 0 ? [fifo, "/dev/zero"] : ["/dev/zero"];
    for (const input of inputs) {
      for (const cmd of [["run"], ["report", "--no-3d", "--out", at("p.html")], ["compare"]]) {
        const r = spawnCli([cmd[0]!, input, ...cmd.slice(1)], 30_000);
        expect(r.error, `${cmd[0]} ${input}: finished within the timeout`).toBeUndefined();
        expect(r.status, `${cmd[0]} ${input}: exit 2 (stderr: ${r.stderr})`).toBe(2);
        expect(r.stderr, `${cmd[0]} ${input}: says why`).toMatch(/is a (pipe|device), not a regular file/);
      }
    }
  }, 120_000);
  it("exits 2 for deep nesting as a real process, with no stack overflow", () => {
    const r = spawnCli(["run", "deep-arrays.json"]);
    expect(r.status, r.stderr).toBe(2);
    expect(r.stderr, "no stack overflow").not.toMatch(NO_STACK);
  });
});
