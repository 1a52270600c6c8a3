/**
 * The invented base scenario that the scenario-rule, study and record tests start from: a 4-port line
 * diffuser, 0.25 m³/s of 65 g/kg brine in 15 m of uniform 36 g/kg water with a weak current, and a 2 g/kg
 * salinity increase allowed at a 100 m mixing-zone edge. A fresh object on every call, so a test may edit it.
 */
export function fourPortScenarioRaw(name: string): Record<string, any> {
  return {
    format: "brinefield-scenario",
    version: 1,
    name,
    discharge: { flow: 0.25, salinity: 65, temperature: 22 },
    ambient: { depth: 15, salinity: 36, temperature: 20, currentSpeed: 0.1, currentDirection: 90 },
    diffuser: {
      layout: "line",
      portCount: 4,
      portDiameter: 0.12,
      portAngle: 60,
      portHeight: 1,
      portSpacing: 5,
      portAzimuth: 0,
      diffuserAzimuth: 90,
    },
    mixingZone: { radius: 100, limits: [{ constituent: "salinity", maxIncrease: 2 }] },
  };
}
