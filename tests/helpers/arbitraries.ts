/**
 * fast-check generators of scenario files: valid ones across the whole input space the format accepts,
 * and invalid ones made by one targeted corruption of a valid file.
 */
import fc from "fast-check";

/**
 * A double spread evenly over [min, max]. (fc.double favours tiny magnitudes such as 1e-89 and the
 * bounds themselves, which left most generated ports horizontal and most heights zero.)
 */
const num = (min: number, max: number) =>
  fc.integer({ min: 0, max: 1_000_000 }).map((i) => min + ((max - min) * i) / 1_000_000);

/**
 * Names a user may type: markup, spreadsheet formulas, prototype keys, right-to-left and astral
 * characters, long text, plus arbitrary strings. None of them may change a number.
 */
const oddName = fc.oneof(
  fc.constantFrom(
    "generated",
    "__proto__",
    "constructor",
    "toString",
    '=HYPERLINK("http://x","y")',
    "+1-2@3",
    "<script>alert(1)</script> & 'quotes' \"too\"",
    "Ωmega bay – ☃ 🐟",
    "מפרץ",
    " leading and trailing spaces ",
    "x".repeat(60),
  ),
  fc.string({ minLength: 1, maxLength: 40 }),
);

/**
 * A valid raw scenario: every field within the schema's bounds, of either buoyancy — a brine denser than
 * the sea, or a blend lighter than it (fresher, or warmer) that rises. It covers single, line and rosette
 * diffusers; the discharge given directly or through a plant section (with and without a blending
 * stream); extra constituents with their own limits; listed ambient cases; both near-field and every
 * beyond-near-field option; and odd names.
 */
export const validScenarioFile = fc
  .record({
    depth: num(2, 200),
    portHeightFrac: num(0, 0.4),
    ambientS: num(5, 42),
    ambientT: num(0, 32),
    excessS: num(0.5, 80),
    brineT: num(0, 40),
    flow: num(0.001, 8),
    layout: fc.constantFrom("single", "line", "rosette"),
    portCount: fc.integer({ min: 2, max: 60 }),
    risers: fc.integer({ min: 1, max: 8 }),
    portsPerRiser: fc.integer({ min: 2, max: 8 }),
    diameter: num(0.02, 0.6),
    angle: num(0, 90),
    spacingFactor: num(1, 40), // ports at least one diameter apart (closer ports overlap and are refused)
    azimuth: num(0, 360),
    current: fc.oneof(fc.constant(0), num(0, 1.2)),
    currentDir: num(0, 360),
    radius: num(5, 2000),
    maxIncrease: num(0.1, 10),
    slope: fc.oneof(fc.constant(0), num(0, 0.2)),
    stratified: fc.boolean(),
    stratDelta: num(0, 1.5),
    unitStrings: fc.boolean(),
    plant: fc.option(
      fc.record({ recovery: num(0.3, 0.6), rejection: num(0.99, 1), blendFrac: fc.oneof(fc.constant(0), num(0, 0.5)) }),
      { nil: undefined },
    ),
    constituents: fc.array(
      fc.record({
        concentration: num(0.01, 1000),
        backgroundFrac: num(0, 0.5),
        limitFrac: num(0.001, 0.5),
        absolute: fc.boolean(),
      }),
      { maxLength: 3 },
    ),
    cases: fc.array(
      fc.record({
        sFrac: num(0, 1),
        tFrac: num(0, 1),
        current: fc.option(num(0, 1.2), { nil: undefined }),
        weight: num(0, 10),
      }),
      { maxLength: 3 },
    ),
    options: fc.option(
      fc.record({
        nearFieldForEdge: fc.constantFrom("conservative", "length-scale", "integral"),
        farField: fc.constantFrom("conservative", "gravity-current", "passive-diffusion"),
        addSlackWater: fc.boolean(),
      }),
      { nil: undefined },
    ),
    name: oddName,
    constituentNames: fc.uniqueArray(
      oddName.filter((n) => !/^\s*(salinity|temperature)\s*$/i.test(n)),
      { minLength: 3, maxLength: 3, selector: (n) => n.trim().toLowerCase() },
    ),
    rising: fc.boolean(),
    deficitS: num(0, 30),
    warmth: num(0, 20),
  })
  .map((v) => {
    const portHeight = Math.min(v.depth * v.portHeightFrac, v.depth - v.diameter - 0.5);
    // Dense: a clear salt excess relative to any temperature excess (≈ 0.8 g/kg per 3 °C), with room for
    // the listed cases, which may make the sea up to 0.1 × excess saltier and 0.3 × excess °C colder.
    // Rising: fresher and/or warmer than the sea (a blend with wastewater or cooling water); near-neutral
    // draws may still sink at the port once pressure acts, and are checked as dense jets then.
    const brineS = v.rising ? Math.max(0, v.ambientS - v.deficitS) : Math.min(160, v.ambientS + v.excessS);
    const brineT = v.rising ? Math.min(60, v.ambientT + v.warmth) : Math.min(v.brineT, v.ambientT + v.excessS * 1.5);
    const ambient: Record<string, unknown> = v.stratified
      ? {
          depth: v.depth,
          profile: [
            { depth: 0, salinity: Math.max(0, v.ambientS - v.stratDelta), temperature: v.ambientT + v.stratDelta },
            { depth: v.depth, salinity: v.ambientS, temperature: v.ambientT },
          ],
        }
      : {
          depth: v.unitStrings ? `${v.depth * 3.28084} ft` : v.depth,
          salinity: v.ambientS,
          temperature: v.unitStrings ? `${v.ambientT} degC` : v.ambientT,
        };
    ambient.currentSpeed = v.current;
    ambient.currentDirection = v.currentDir;
    ambient.bedSlope = v.slope;
    const spacing = v.diameter * v.spacingFactor + 0.1;
    const diffuser: Record<string, unknown> = {
      layout: v.layout,
      portDiameter: v.diameter,
      portAngle: v.angle,
      portHeight: Math.max(0, portHeight),
      portAzimuth: v.azimuth,
    };
    let ports = 1;
    if (v.layout === "line") {
      ports = v.portCount;
      Object.assign(diffuser, { portCount: ports, portSpacing: spacing });
    } else if (v.layout === "rosette") {
      ports = v.risers * v.portsPerRiser;
      diffuser.risers = { count: v.risers, portsPerRiser: v.portsPerRiser, spacing: spacing * 2 };
    } else {
      diffuser.portCount = 1;
    }
    // Keep the exit velocity within the accepted 30 m/s (the format refuses faster ports as input mistakes).
    const area = (Math.PI * v.diameter * v.diameter) / 4;
    const maxFlow = 0.95 * 30 * area * ports;
    const constituents = v.constituents.map((c, i) => ({
      name: v.constituentNames[i]!,
      concentration: c.concentration,
      unit: "mg/L",
      background: c.concentration * c.backgroundFrac,
    }));
    const limits: Record<string, unknown>[] = [{ constituent: "salinity", maxIncrease: v.maxIncrease }];
    v.constituents.forEach((c, i) => {
      const bg = c.concentration * c.backgroundFrac;
      const allowed = (c.concentration - bg) * c.limitFrac;
      limits.push(
        c.absolute
          ? { constituent: constituents[i]!.name, maxConcentration: bg + allowed }
          : { constituent: constituents[i]!.name, maxIncrease: allowed },
      );
    });
    let discharge: Record<string, unknown>;
    let plant: Record<string, unknown> | undefined;
    if (v.plant) {
      // Plant mass balance (common practice, no source): brine flow = product × (1 − r)/r; a blending
      // stream of seawater at ambient salinity and temperature joins it.
      const r = v.plant.recovery;
      const brineFlow = Math.min(v.flow, maxFlow / (1 + v.plant.blendFrac));
      const productFlow = Math.min(50, (brineFlow * r) / (1 - r));
      const feedS = Math.min(80, brineS * (1 - r));
      plant = {
        productFlow,
        recovery: r,
        feedSalinity: feedS,
        saltRejection: v.plant.rejection,
        feedTemperature: brineT,
        ...(v.plant.blendFrac > 0
          ? {
              blending: [
                {
                  name: "seawater bypass",
                  flow: brineFlow * v.plant.blendFrac,
                  salinity: v.ambientS,
                  temperature: v.ambientT,
                },
              ],
            }
          : {}),
      };
      discharge = constituents.length > 0 ? { constituents } : {};
    } else {
      const flow = Math.min(v.flow, maxFlow);
      discharge = {
        flow: v.unitStrings ? `${flow} m^3/s` : flow,
        salinity: brineS,
        temperature: brineT,
        ...(constituents.length > 0 ? { constituents } : {}),
      };
    }
    const ambientCases = v.cases.map((c, i) => ({
      name: `${v.name.slice(0, 40)} case ${i + 1}`,
      weight: c.weight,
      // From 1 g/kg fresher to 0.1 × excess saltier; from 3 °C warmer to 0.3 × excess °C colder.
      salinity: Math.max(0, v.ambientS - 1 + c.sFrac * (1 + 0.1 * v.excessS)),
      temperature: Math.max(-2, v.ambientT + 3 - c.tFrac * (3 + 0.3 * v.excessS)),
      ...(c.current !== undefined ? { currentSpeed: c.current } : {}),
    }));
    return {
      format: "brinefield-scenario",
      version: 1,
      name: v.name,
      discharge,
      ...(plant ? { plant } : {}),
      ambient,
      ...(ambientCases.length > 0 ? { ambientCases } : {}),
      diffuser,
      mixingZone: { radius: v.radius, limits },
      ...(v.options ? { options: v.options } : {}),
    };
  });

/** Valid files that give the discharge directly (the corruptions below delete or break its fields). */
export const directDischargeFile = validScenarioFile.filter((f) => !("plant" in f));

type Corruption = (o: any) => void;

const setAt =
  (path: string[], value: unknown): Corruption =>
  (o) => {
    let cur = o;
    for (const k of path.slice(0, -1)) cur = cur[k];
    cur[path[path.length - 1]!] = value;
  };
const deleteAt =
  (path: string[]): Corruption =>
  (o) => {
    let cur = o;
    for (const k of path.slice(0, -1)) cur = cur[k];
    delete cur[path[path.length - 1]!];
  };

const requiredPaths = [
  ["ambient", "depth"],
  ["diffuser", "portDiameter"],
  ["diffuser", "portAngle"],
  ["diffuser", "portHeight"],
  ["mixingZone", "radius"],
  ["discharge", "flow"],
  ["discharge", "salinity"],
  ["discharge", "temperature"],
  ["name"],
];
const numericPaths = [
  ["ambient", "depth"],
  ["diffuser", "portDiameter"],
  ["diffuser", "portAngle"],
  ["diffuser", "portHeight"],
  ["mixingZone", "radius"],
  ["discharge", "flow"],
  ["discharge", "salinity"],
  ["discharge", "temperature"],
  ["diffuser", "portCount"],
];

function deep(n: number): unknown {
  let v: unknown = 1;
  for (let i = 0; i < n; i++) v = { a: v };
  return v;
}

/** One corruption that must make any valid file invalid. */
export const corruption: fc.Arbitrary<{ what: string; apply: Corruption }> = fc.oneof(
  fc.constantFrom(...requiredPaths).map((p) => ({ what: `missing ${p.join(".")}`, apply: deleteAt(p) })),
  fc
    .tuple(
      fc.constantFrom(...numericPaths),
      fc.constantFrom<unknown>(
        Number.NaN,
        Number.POSITIVE_INFINITY,
        -Infinity,
        1e308,
        -1e308,
        "1e400 m",
        null,
        true,
        [],
        {},
        "",
        "abc",
      ),
    )
    .map(([p, v]) => ({ what: `${p.join(".")} = ${String(v)}`, apply: setAt(p, v) })),
  fc
    .tuple(
      fc.constantFrom(...numericPaths.slice(0, 7)),
      fc.constantFrom("3 furlongs", "12 parsecs", "5 kg", "20 widgets"),
    )
    .map(([p, v]) => ({ what: `${p.join(".")} = ${v}`, apply: setAt(p, v) })),
  fc
    .constantFrom<unknown>("x", 2, 99, 0, -1, "1", null)
    .map((v) => ({ what: `version ${String(v)}`, apply: setAt(["version"], v) })),
  fc
    .constantFrom<unknown>("brinefield-result", "", 7, null)
    .map((v) => ({ what: `format ${String(v)}`, apply: setAt(["format"], v) })),
  fc.integer({ min: 600, max: 5000 }).map((n) => ({
    what: `profile of ${n} points`,
    apply: setAt(["ambient"], {
      depth: 10,
      profile: Array.from({ length: n }, (_, i) => ({ depth: i * 0.01, salinity: 35, temperature: 15 })),
    }),
  })),
  fc
    .integer({ min: 50, max: 2000 })
    .map((n) => ({ what: `nesting ${n} deep`, apply: setAt(["diffuser", "risers"], deep(n)) })),
  fc
    .string({ minLength: 1, maxLength: 12 })
    .filter(
      (k) =>
        /^[a-z]+$/i.test(k) &&
        ![
          "depth",
          "salinity",
          "temperature",
          "profile",
          "currentSpeed",
          "currentDirection",
          "bedSlope",
          "bedSlopeAzimuth",
        ].includes(k),
    )
    .map((k) => ({
      what: `unknown field ambient.${k}`,
      apply: setAt(["ambient", k], 1),
    })),
);
