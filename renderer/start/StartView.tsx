/** Start view: demo scenarios, recent files, a new blank scenario, open from disk. */
import { useModal } from "../ui/use-modal";
import type { DemoScenario } from "../demos";

export interface StartViewProps {
  readonly demos: readonly DemoScenario[];
  readonly recent: readonly string[];
  onDemo(demo: DemoScenario): void;
  onRecent(path: string): void;
  onNew(): void;
  onOpen(): void;
  onClose(): void;
}

function baseName(path: string): string {
  return path.replace(/^.*[\\/]/, "");
}

export function StartView(props: StartViewProps) {
  const dialogRef = useModal<HTMLDivElement>(props.onClose);
  return (
    <div
      className="start-view"
      role="dialog"
      aria-modal="true"
      aria-labelledby="start-title"
      data-role="start-view"
      tabIndex={-1}
      ref={dialogRef}
    >
      <div className="start-card">
        <header>
          <h1 id="start-title">Brinefield</h1>
          <p>
            Screening of seabed diffusers for desalination brine: near-field mixing, the spreading layer, and the
            salinity limit at the mixing-zone edge.
          </p>
          <button type="button" className="close" aria-label="Close start view" onClick={props.onClose}>
            ×
          </button>
        </header>
        <div className="start-columns">
          <section>
            <h2>Demo scenarios</h2>
            <ul className="start-list">
              {props.demos.map((d) => (
                <li key={d.id}>
                  <button type="button" onClick={() => props.onDemo(d)} data-demo={d.id}>
                    <b>{d.name}</b>
                    {d.description ? <span>{d.description}</span> : null}
                  </button>
                </li>
              ))}
              {props.demos.length === 0 ? <li className="muted">No demo scenarios bundled.</li> : null}
            </ul>
          </section>
          <section>
            <h2>Start</h2>
            <ul className="start-list">
              <li>
                <button type="button" onClick={props.onNew}>
                  <b>New blank scenario</b>
                  <span>A single 60° port in uniform water to fill in. Ctrl+N</span>
                </button>
              </li>
              <li>
                <button type="button" onClick={props.onOpen}>
                  <b>Open scenario file…</b>
                  <span>A .json scenario; or drop one on the window. Ctrl+O</span>
                </button>
              </li>
            </ul>
            <h2>Recent files</h2>
            <ul className="start-list recent">
              {props.recent.map((p) => (
                <li key={p}>
                  <button type="button" onClick={() => props.onRecent(p)} title={p}>
                    <b>{baseName(p)}</b>
                    <span>{p !== baseName(p) ? p : ""}</span>
                  </button>
                </li>
              ))}
              {props.recent.length === 0 ? <li className="muted">None yet.</li> : null}
            </ul>
          </section>
        </div>
      </div>
    </div>
  );
}
