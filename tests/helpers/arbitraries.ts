/**
 * fast-check generators of scenario files: valid ones across the whole input space the format accepts,
 * and invalid ones made by one targeted corruption of a valid file.
 */
import fc from "fast-check";

const num = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

/**
 * A valid raw scenario: every field within the schema's bounds, of either buoyancy — a brine denser than
 * the sea, or a blend lighter than it (fresher, or warmer) that rises.
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
    portCount: fc.integer({ min: 1, max: 60 }),
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
    rising: fc.boolean(),
    deficitS: num(0, 30),
    warmth: num(0, 20),
  })
  .map((v) => {
    const portHeight = Math.min(v.depth * v.portHeightFrac, v.depth - v.diameter - 0.5);
    // Dense: a clear salt excess relative to any temperature excess (≈ 0.8 g/kg per 3 °C). Rising: fresher
    // and/or warmer than the sea (a blend with wastewater or cooling water); near-neutral draws may still
    // sink at the port once pressure acts, and are checked as dense jets then.
    const brineS = v.rising ? Math.max(0, v.ambientS - v.deficitS) : Math.min(160, v.ambientS + v.excessS);
    const brineT = v.rising ? Math.min(60, v.ambientT + v.warmth) : Math.min(v.brineT, v.ambientT + v.excessS * 2);
    const ambient: Record<string, unknown> = v.stratified
      ? {
          depth: v.depth,
          profile: [
            { depth: 0, salinity: Math.max(0, v.ambientS - v.stratDelta), temperature: v.ambientT + v.stratDelta },
            { depth: v.depth, salinity: v.ambientS, temperature: v.ambientT },
          ],
        }
      : { depth: v.unitStrings ? `${v.depth * 3.28084} ft` : v.depth, salinity: v.ambientS, temperature: v.unitStrings ? `${v.ambientT} degC` : v.ambientT };
    ambient.currentSpeed = v.current;
    ambient.currentDirection = v.currentDir;
    ambient.bedSlope = v.slope;
    // Keep the exit velocity within the accepted 30 m/s (the format refuses faster ports as input mistakes).
    const area = (Math.PI * v.diameter * v.diameter) / 4;
    const flow = Math.min(v.flow, 0.95 * 30 * area * v.portCount);
    return {
      format: "brinefield-scenario",
      version: 1,
      name: "generated",
      discharge: { flow: v.unitStrings ? `${flow} m^3/s` : flow, salinity: brineS, temperature: brineT },
      ambient,
      diffuser: {
        portCount: v.portCount,
        portDiameter: v.diameter,
        portAngle: v.angle,
        portHeight: Math.max(0, portHeight),
        portSpacing: v.diameter * v.spacingFactor + 0.1,
        portAzimuth: v.azimuth,
      },
      mixingZone: { radius: v.radius, limits: [{ constituent: "salinity", maxIncrease: v.maxIncrease }] },
    };
  });

type Corruption = (o: any) => void;

const setAt = (path: string[], value: unknown): Corruption => (o) => {
  let cur = o;
  for (const k of path.slice(0, -1)) cur = cur[k];
  cur[path[path.length - 1]!] = value;
};
const deleteAt = (path: string[]): Corruption => (o) => {
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
    .tuple(fc.constantFrom(...numericPaths), fc.constantFrom<unknown>(Number.NaN, Number.POSITIVE_INFINITY, -Infinity, 1e308, -1e308, "1e400 m", null, true, [], {}, "", "abc"))
    .map(([p, v]) => ({ what: `${p.join(".")} = ${String(v)}`, apply: setAt(p, v) })),
  fc
    .tuple(fc.constantFrom(...numericPaths.slice(0, 7)), fc.constantFrom("3 furlongs", "12 parsecs", "5 kg", "20 widgets"))
    .map(([p, v]) => ({ what: `${p.join(".")} = ${v}`, apply: setAt(p, v) })),
  fc.constantFrom<unknown>("x", 2, 99, 0, -1, "1", null).map((v) => ({ what: `version ${String(v)}`, apply: setAt(["version"], v) })),
  fc.constantFrom<unknown>("brinefield-result", "", 7, null).map((v) => ({ what: `format ${String(v)}`, apply: setAt(["format"], v) })),
  fc.integer({ min: 600, max: 5000 }).map((n) => ({
    what: `profile of ${n} points`,
    apply: setAt(["ambient"], { depth: 10, profile: Array.from({ length: n }, (_, i) => ({ depth: i * 0.01, salinity: 35, temperature: 15 })) }),
  })),
  fc.integer({ min: 50, max: 2000 }).map((n) => ({ what: `nesting ${n} deep`, apply: setAt(["diffuser", "risers"], deep(n)) })),
  fc.string({ minLength: 1, maxLength: 12 }).filter((k) => /^[a-z]+$/i.test(k) && !["depth", "salinity", "temperature", "profile", "currentSpeed", "currentDirection", "bedSlope", "bedSlopeAzimuth"].includes(k)).map((k) => ({
    what: `unknown field ambient.${k}`,
    apply: setAt(["ambient", k], 1),
  })),
);
