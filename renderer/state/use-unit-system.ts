/** The unit system shown everywhere, remembered between sessions where storage allows. */
import { useEffect, useState } from "react";
import type { UnitSystem } from "../../core/units";

const UNITS_KEY = "brinefield.units";

function initialUnits(): UnitSystem {
  try {
    return localStorage.getItem(UNITS_KEY) === "us" ? "us" : "si";
  } catch {
    return "si";
  }
}

export function useUnitSystem(): [UnitSystem, (units: UnitSystem) => void] {
  const [unitSystem, setUnitSystem] = useState<UnitSystem>(initialUnits);
  useEffect(() => {
    try {
      localStorage.setItem(UNITS_KEY, unitSystem);
    } catch {
      // storage disabled: the choice lasts for the session
    }
  }, [unitSystem]);
  return [unitSystem, setUnitSystem];
}
