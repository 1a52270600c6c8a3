/**
 * The 3D view: draws the scene from plumeScene.ts with orbit/zoom, reset and preset views, a dilution
 * legend with numbers, and renders only on demand (no animation loop) so it stays cheap on software WebGL.
 */
import { useCallback, useEffect, useRef, useState } from "react";
import {
  AmbientLight,
  DirectionalLight,
  HemisphereLight,
  PerspectiveCamera,
  Scene,
  Color,
  Vector3,
  WebGLRenderer,
} from "three";
import { OrbitControls } from "three/examples/jsm/controls/OrbitControls.js";
import type { BrinefieldResult } from "../../core/result/contract";
import type { Scenario } from "../../core/scenario/types";
import type { UnitSystem } from "../../core/units";
import { buildPlumeScene, type PlumeSceneOutput } from "./plumeScene";
import { azimuthToEastNorth } from "./plumeGeometry";
import { DilutionLegend, type LegendContent } from "./DilutionLegend";
import { Compass, screenBearing } from "./Compass";

export type ViewPreset = "perspective" | "side" | "plan" | "overview";

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

interface Stage {
  renderer: WebGLRenderer;
  scene: Scene;
  camera: PerspectiveCamera;
  controls: OrbitControls;
  content: PlumeSceneOutput | null;
  frame: number;
}

function placeCamera(stage: Stage, preset: ViewPreset): void {
  const content = stage.content;
  if (!content) return;
  const { centre, radius } = content.focus;
  const heading = azimuthToEastNorth(content.heading);
  const fovFactor = 1 / Math.tan(((stage.camera.fov / 2) * Math.PI) / 180);
  const distance = radius * fovFactor * 1.5;
  const target = centre.clone();
  let offset: Vector3;
  switch (preset) {
    case "side": {
      // Looking across the jet (perpendicular to its heading), horizontally, at the nearest port's jet.
      const across = new Vector3(-heading.north, 0, -heading.east);
      const jets = content.jets;
      const nearest = jets.centres.reduce(
        (best, c) => (c.dot(across) > best.dot(across) ? c : best),
        jets.centres[0] ?? centre,
      );
      target.copy(nearest);
      offset = across.multiplyScalar(jets.radius * fovFactor * 1.35);
      break;
    }
    case "plan":
      offset = new Vector3(0, distance * 1.1, 0.0001);
      break;
    case "overview": {
      target.set(0, -content.depth, 0);
      const d = content.extent * fovFactor * 1.05;
      offset = new Vector3(-0.45 * d, 0.75 * d, 0.55 * d);
      break;
    }
    default:
      // Oblique from behind-left of the jet and above.
      offset = new Vector3(-heading.east * 0.45 - heading.north * 0.8, 0.75, heading.north * 0.45 - heading.east * 0.8)
        .normalize()
        .multiplyScalar(distance);
  }
  stage.camera.position.copy(target).add(offset);
  stage.camera.up.set(0, 1, 0);
  stage.controls.target.copy(target);
  stage.camera.near = Math.max(0.01, content.extent / 2000);
  stage.camera.far = content.extent * 20;
  stage.camera.updateProjectionMatrix();
  stage.controls.update();
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
      stage.renderer.render(stage.scene, stage.camera);
      // The compass turns with the camera: north and the current as they point on screen.
      const compass = compassRef.current;
      if (compass && stage.content) {
        const canvas = stage.renderer.domElement;
        const north = screenBearing(stage.camera, stage.controls.target, 0, canvas.clientWidth, canvas.clientHeight);
        if (north !== null) {
          compass.style.setProperty("--north", `${north}deg`);
          canvas.dataset.northBearing = north.toFixed(1);
        }
        const flow = stage.content.current;
        const towards = flow
          ? screenBearing(stage.camera, stage.controls.target, flow.toward, canvas.clientWidth, canvas.clientHeight)
          : null;
        if (towards !== null) compass.style.setProperty("--current", `${towards}deg`);
      }
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
    renderer.setPixelRatio(Math.min(2, window.devicePixelRatio || 1));
    renderer.domElement.dataset.role = "plume-canvas";
    renderer.domElement.setAttribute(
      "aria-label",
      "3D view of the discharge: seabed, jets coloured by dilution, mixing zone",
    );
    renderer.domElement.setAttribute("role", "img");
    renderer.domElement.tabIndex = 0;
    host.appendChild(renderer.domElement);
    const scene = new Scene();
    scene.background = new Color(0xeef3f7);
    scene.add(new HemisphereLight(0xffffff, 0xb8a98a, 1.6));
    scene.add(new AmbientLight(0xffffff, 0.35));
    const sun = new DirectionalLight(0xffffff, 1.3);
    sun.position.set(-0.4, 1, 0.6);
    scene.add(sun);
    const camera = new PerspectiveCamera(40, 1, 0.1, 5000);
    const controls = new OrbitControls(camera, renderer.domElement);
    controls.enableDamping = false;
    controls.listenToKeyEvents(renderer.domElement);
    const stage: Stage = { renderer, scene, camera, controls, content: null, frame: 0 };
    stageRef.current = stage;
    controls.addEventListener("change", () => render());
    const resize = () => {
      const width = Math.max(1, host.clientWidth);
      const height = Math.max(1, host.clientHeight);
      renderer.setSize(width, height, true);
      camera.aspect = width / height;
      camera.updateProjectionMatrix();
      render();
    };
    const observer = new ResizeObserver(resize);
    observer.observe(host);
    resize();
    return () => {
      observer.disconnect();
      if (stage.frame) cancelAnimationFrame(stage.frame);
      controls.dispose();
      stage.content?.dispose();
      renderer.dispose();
      renderer.domElement.remove();
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

  // Keyboard: R resets, S side, P plan, M mixing zone, while the canvas has focus.
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
  }, [choose]);

  return (
    <div className={compact ? "plume-view compact" : "plume-view"}>
      {!compact ? (
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
      ) : null}
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
