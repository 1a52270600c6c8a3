/**
 * The 3D view: draws the scene from plume-scene.ts with orbit/zoom, reset and preset views, a dilution
 * legend with numbers, and renders only on demand (no animation loop) so it stays cheap on software WebGL.
 */
import { useCallback, useEffect, useRef, useState, type RefObject } from "react";
import { WebGLRenderer } from "three";
import type { BrinefieldResult } from "../../core/result/contract";
import type { Scenario } from "../../core/scenario/types";
import type { UnitSystem } from "../../core/units";
import { buildPlumeScene, type PlumeSceneOutput } from "./plume-scene";
import { DilutionLegend, type LegendContent } from "./DilutionLegend";
import { Compass } from "./Compass";
import { drawFrame, mountStage, placeCamera, type Stage, type ViewPreset } from "./plume-stage";

export type { ViewPreset } from "./plume-stage";

export interface PlumeViewProps {
  readonly scenario: Scenario;
  readonly result: BrinefieldResult;
  readonly unitSystem: UnitSystem;
  /** Called once after the first frame with content has been drawn. */
  readonly onFirstFrame?: () => void;
  readonly compact?: boolean;
  /** Bumping this number resets the camera now (menu command). */
  readonly resetSignal?: number;
  /** Changes when another document is loaded: the camera is placed afresh on its first result. */
  readonly documentKey?: number;
}

export function PlumeView(props: PlumeViewProps) {
  const { scenario, result, unitSystem, onFirstFrame, compact, resetSignal, documentKey } = props;
  const hostRef = useRef<HTMLDivElement | null>(null);
  const stageRef = useRef<Stage | null>(null);
  const firstFrameSent = useRef(false);
  // Held in a ref so a new callback identity never rebuilds the renderer.
  const onFirstFrameRef = useRef(onFirstFrame);
  onFirstFrameRef.current = onFirstFrame;
  const presetRef = useRef<ViewPreset>("perspective");
  const placedForDocument = useRef<number | undefined>(documentKey);
  const [failure, setFailure] = useState<string | null>(null);
  const [legend, setLegend] = useState<LegendContent | null>(null);
  const [current, setCurrent] = useState<PlumeSceneOutput["current"]>(null);
  const compassRef = useRef<SVGSVGElement | null>(null);

  const render = useCallback(() => {
    const stage = stageRef.current;
    if (!stage || stage.frame) return;
    stage.frame = requestAnimationFrame(() => {
      stage.frame = 0;
      drawFrame(stage, compassRef.current);
      if (stage.content && !firstFrameSent.current) {
        firstFrameSent.current = true;
        onFirstFrameRef.current?.();
      }
    });
  }, []);

  // Renderer, camera, controls: created once.
  useEffect(() => {
    const host = hostRef.current;
    if (!host) return;
    let renderer: WebGLRenderer;
    try {
      renderer = new WebGLRenderer({ antialias: true, preserveDrawingBuffer: true, alpha: false });
    } catch (error) {
      setFailure(`3D view unavailable: ${error instanceof Error ? error.message : String(error)}`);
      return;
    }
    const unmount = mountStage(host, renderer, render, (stage) => {
      stageRef.current = stage;
    });
    return () => {
      unmount();
      stageRef.current = null;
    };
  }, [render]);

  // Scene content: rebuilt whenever the result changes; the camera is kept unless it was never placed.
  useEffect(() => {
    const stage = stageRef.current;
    if (!stage) return;
    const previous = stage.content;
    let content: PlumeSceneOutput;
    try {
      content = buildPlumeScene({ scenario, result, unitSystem });
    } catch (error) {
      setFailure(`3D view could not draw this result: ${error instanceof Error ? error.message : String(error)}`);
      return;
    }
    // A result that draws replaces the message a failed one left.
    setFailure(null);
    if (previous) {
      stage.scene.remove(previous.group);
      previous.dispose();
    }
    stage.scene.add(content.group);
    stage.content = content;
    // A new document (or a very different scale) gets a fresh camera; edits keep the user's view.
    const rescaled =
      previous !== null && (content.extent > previous.extent * 1.6 || content.extent < previous.extent / 1.6);
    const newDocument = placedForDocument.current !== documentKey;
    if (newDocument) presetRef.current = "perspective";
    if (!previous || rescaled || newDocument) placeCamera(stage, presetRef.current);
    placedForDocument.current = documentKey;
    setLegend({ domain: content.domain, notes: content.notes, drawn: content.drawn, unitSystem });
    setCurrent(content.current);
    render();
    // documentKey is read through placedForDocument; a new key alone (old result) must not re-place.
    // eslint-disable-next-line react-hooks/exhaustive-deps -- see the comment above: the omitted values are read through refs on purpose
  }, [scenario, result, unitSystem, render]);

  const choose = useCallback(
    (preset: ViewPreset) => {
      const stage = stageRef.current;
      if (!stage) return;
      presetRef.current = preset;
      placeCamera(stage, preset);
      render();
    },
    [render],
  );

  useEffect(() => {
    if (resetSignal) choose("perspective");
  }, [resetSignal, choose]);

  usePresetKeys(stageRef, choose);

  return (
    <div className={compact ? "plume-view compact" : "plume-view"}>
      {!compact ? <PlumeToolbar choose={choose} /> : null}
      <div className="plume-canvas-host" ref={hostRef} />
      {failure ? (
        <div className="plume-failure" role="alert">
          {failure}
        </div>
      ) : null}
      <Compass ref={compassRef} current={current} unitSystem={unitSystem} />
      {legend ? <DilutionLegend content={compact ? { ...legend, notes: [] } : legend} /> : null}
    </div>
  );
}

/** Keyboard: R resets, S side, P plan, M mixing zone, while the canvas has focus. */
function usePresetKeys(stageRef: RefObject<Stage | null>, choose: (preset: ViewPreset) => void): void {
  useEffect(() => {
    const canvas = stageRef.current?.renderer.domElement;
    if (!canvas) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.ctrlKey || e.metaKey || e.altKey) return;
      const preset = ({ r: "perspective", s: "side", p: "plan", m: "overview" } as const)[
        e.key.toLowerCase() as "r" | "s" | "p" | "m"
      ];
      if (preset) {
        e.preventDefault();
        choose(preset);
      }
    };
    canvas.addEventListener("keydown", onKey);
    return () => canvas.removeEventListener("keydown", onKey);
  }, [stageRef, choose]);
}

/** Buttons for the preset views (the same as the keys R, S, P and M on the canvas). */
function PlumeToolbar({ choose }: { choose: (preset: ViewPreset) => void }) {
  return (
    <div className="plume-toolbar" role="toolbar" aria-label="3D view">
      <button type="button" onClick={() => choose("perspective")} title="Reset the view (R)">
        Reset
      </button>
      <button type="button" onClick={() => choose("side")} title="Side view (S)">
        Side
      </button>
      <button type="button" onClick={() => choose("plan")} title="Plan view (P)">
        Plan
      </button>
      <button
        type="button"
        onClick={() => choose("overview")}
        title="The whole mixing zone and any area where the limit is exceeded (M)"
      >
        Mixing zone
      </button>
    </div>
  );
}
