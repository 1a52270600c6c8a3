/**
 * The 3D view's stage: the WebGL renderer with scene, lights, camera and orbit controls, the camera presets,
 * and one frame's drawing (the scene and the compass turned with the camera).
 */
import {
  AmbientLight,
  DirectionalLight,
  HemisphereLight,
  PerspectiveCamera,
  Scene,
  Color,
  Vector3,
  type WebGLRenderer,
} from "three";
import { OrbitControls } from "three/examples/jsm/controls/OrbitControls.js";
import type { PlumeSceneOutput } from "./plume-scene";
import { azimuthToEastNorth } from "./plume-geometry";
import { screenBearing } from "./Compass";

export type ViewPreset = "perspective" | "side" | "plan" | "overview";

export interface Stage {
  renderer: WebGLRenderer;
  scene: Scene;
  camera: PerspectiveCamera;
  controls: OrbitControls;
  content: PlumeSceneOutput | null;
  frame: number;
}

export function placeCamera(stage: Stage, preset: ViewPreset): void {
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

/** Draws one frame; the compass turns with the camera: north and the current as they point on screen. */
export function drawFrame(stage: Stage, compass: SVGSVGElement | null): void {
  stage.renderer.render(stage.scene, stage.camera);
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
}

/**
 * Puts the renderer's canvas into `host` with scene, lights, camera and controls; `onStage` receives the stage
 * before the first resize draws. Returns what undoes it all.
 */
export function mountStage(
  host: HTMLElement,
  renderer: WebGLRenderer,
  render: () => void,
  onStage: (stage: Stage) => void,
): () => void {
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
  onStage(stage);
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
  };
}
