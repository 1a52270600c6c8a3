/**
 * UI commands as data-in/data-out actions: `perform(state, input)` returns the next document state and
 * never touches the DOM. Components dispatch actions by name; tests call `perform` directly.
 */
import {
  getAtPath,
  isPlainObject,
  patchAtPath,
  updateScenario,
  type DocumentState,
  type ScenarioFile,
} from "./scenario-state";

export interface Action<Input> {
  readonly name: string;
  perform(state: DocumentState, input: Input): DocumentState;
}

function arrayAt(file: ScenarioFile, path: string): unknown[] {
  const value = getAtPath(file, path);
  return Array.isArray(value) ? value : [];
}

/** Sets one field, by scenario path, to what the user typed (number in SI or a string with a unit). */
export const setField: Action<{ path: string; value: unknown }> = {
  name: "set-field",
  perform: (state, { path, value }) => updateScenario(state, patchAtPath(state.file, path, value)),
};

export const renameScenario: Action<{ name: string }> = {
  name: "rename-scenario",
  perform: (state, { name }) => updateScenario(state, { name }),
};

/** Switches between giving the discharge directly and deriving it from plant data. */
export const setDischargeSource: Action<{ source: "discharge" | "plant" }> = {
  name: "set-discharge-source",
  perform: (state, { source }) => {
    const discharge = isPlainObject(state.file["discharge"]) ? state.file["discharge"] : {};
    if (source === "plant") {
      const plant = isPlainObject(state.file["plant"])
        ? state.file["plant"]
        : {
            productFlow: 0.5,
            recovery: 0.45,
            feedSalinity: 38,
            saltRejection: 0.996,
            feedTemperature: 22,
            blending: [],
          };
      return updateScenario(state, { plant, discharge: { flow: undefined, salinity: undefined } });
    }
    const next = updateScenario(state, { plant: undefined });
    const flow = discharge["flow"] ?? 1;
    const salinity = discharge["salinity"] ?? 70;
    return updateScenario(next, { discharge: { flow, salinity } });
  },
};

/** Switches the receiving water between uniform values and a depth profile (keeping what it can). */
export const setAmbientMode: Action<{ mode: "uniform" | "profile" }> = {
  name: "set-ambient-mode",
  perform: (state, { mode }) => {
    const ambient = isPlainObject(state.file["ambient"]) ? state.file["ambient"] : {};
    if (mode === "profile") {
      if (Array.isArray(ambient["profile"])) return state;
      const salinity = ambient["salinity"] ?? 38;
      const temperature = ambient["temperature"] ?? 20;
      const depth = ambient["depth"] ?? 10;
      return updateScenario(state, {
        ambient: {
          salinity: undefined,
          temperature: undefined,
          profile: [
            { depth: 0, salinity, temperature },
            { depth, salinity, temperature },
          ],
        },
      });
    }
    const profile = Array.isArray(ambient["profile"]) ? ambient["profile"] : [];
    const first = isPlainObject(profile[0]) ? profile[0] : {};
    return updateScenario(state, {
      ambient: { profile: undefined, salinity: first["salinity"] ?? 38, temperature: first["temperature"] ?? 20 },
    });
  },
};

export const replaceProfile: Action<{ rows: readonly { depth: unknown; salinity: unknown; temperature: unknown }[] }> =
  {
    name: "replace-profile",
    perform: (state, { rows }) =>
      updateScenario(state, {
        ambient: { salinity: undefined, temperature: undefined, profile: rows.map((r) => ({ ...r })) },
      }),
  };

export const addProfileRow: Action<void> = {
  name: "add-profile-row",
  perform: (state) => {
    const rows = arrayAt(state.file, "ambient.profile");
    const last = isPlainObject(rows[rows.length - 1]) ? (rows[rows.length - 1] as ScenarioFile) : {};
    return updateScenario(state, { ambient: { profile: [...rows, { ...last }] } });
  },
};

export const removeArrayItem: Action<{ path: string; index: number }> = {
  name: "remove-array-item",
  perform: (state, { path, index }) => {
    const rows = arrayAt(state.file, path);
    if (index < 0 || index >= rows.length) return state;
    return setField.perform(state, { path, value: rows.filter((_, i) => i !== index) });
  },
};

export const appendArrayItem: Action<{ path: string; item: unknown }> = {
  name: "append-array-item",
  perform: (state, { path, item }) => setField.perform(state, { path, value: [...arrayAt(state.file, path), item] }),
};

/** Changes the diffuser layout and fills in what the new layout needs. */
export const setLayout: Action<{ layout: "single" | "line" | "rosette" }> = {
  name: "set-layout",
  perform: (state, { layout }) => {
    const diffuser = isPlainObject(state.file["diffuser"]) ? state.file["diffuser"] : {};
    const count = typeof diffuser["portCount"] === "number" ? diffuser["portCount"] : 1;
    if (layout === "single") return updateScenario(state, { diffuser: { layout, portCount: 1, risers: undefined } });
    if (layout === "line") {
      return updateScenario(state, { diffuser: { layout, portCount: count > 1 ? count : 10, risers: undefined } });
    }
    const risers = isPlainObject(diffuser["risers"])
      ? diffuser["risers"]
      : { count: 4, portsPerRiser: 4, spacing: diffuser["portSpacing"] ?? 25, portAzimuths: [0, 90, 180, 270] };
    const riserCount = typeof risers["count"] === "number" ? risers["count"] : 1;
    const perRiser = typeof risers["portsPerRiser"] === "number" ? risers["portsPerRiser"] : 1;
    return updateScenario(state, { diffuser: { layout, risers, portCount: riserCount * perRiser } });
  },
};

/**
 * Replaces the diffuser block with a design's block (from the design search, computed in core): keys the
 * design does not set are removed, so nothing of the old layout (spacing, length, flow split) lingers.
 * One undo step.
 */
export const applyDesign: Action<{ diffuser: { readonly [key: string]: unknown } }> = {
  name: "apply-design",
  perform: (state, { diffuser }) => {
    const old = isPlainObject(state.file["diffuser"]) ? state.file["diffuser"] : {};
    const cleared = Object.fromEntries(Object.keys(old).map((k) => [k, undefined]));
    return updateScenario(state, { diffuser: { ...cleared, ...diffuser } });
  },
};

export const ACTIONS = {
  setField,
  renameScenario,
  setDischargeSource,
  setAmbientMode,
  replaceProfile,
  addProfileRow,
  removeArrayItem,
  appendArrayItem,
  setLayout,
  applyDesign,
} as const;
