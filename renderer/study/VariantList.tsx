/** The study's variants as a list to pick one from, and the invitation to start a study. */
import type { StudyVariantDoc } from "../state/study-document";

interface ListProps {
  readonly variants: readonly StudyVariantDoc[];
  readonly index: number;
  readonly onSelect: (index: number) => void;
}

export function VariantList({ variants, index, onSelect }: ListProps) {
  return (
    <nav className="variant-list" aria-label="Variants">
      <ul>
        {variants.map((v, i) => {
          const n = Object.keys(v.overrides).length;
          return (
            <li key={i}>
              <button
                type="button"
                aria-current={i === index ? "true" : undefined}
                onClick={() => onSelect(i)}
                data-variant={v.name}
              >
                <span className="variant-name">{v.name}</span>
                <span className="variant-count">{n === 0 ? "no changes" : `${n} change${n === 1 ? "" : "s"}`}</span>
              </button>
            </li>
          );
        })}
      </ul>
      {variants.length === 0 ? <p className="study-note">No variants: add one.</p> : null}
      <p className="study-note">
        Every variant runs under every ambient case; an ambient change applies to the stated conditions and to every
        case that does not set that field itself.
      </p>
    </nav>
  );
}

/** What a study is, with the button that starts one from the current scenario. */
export function StudyStart({ onStart }: { onStart: () => void }) {
  return (
    <div className="study-start" data-role="study-start">
      <p>
        A study keeps this scenario as its base and adds named variants — a deeper site, more ports, another current —
        each edited with the same fields and units as the Design tab. Save writes one study file (the base scenario
        inside it) that <code>brinefield compare</code> and <code>brinefield report</code> read.
      </p>
      <button type="button" onClick={onStart} data-command="study-start">
        Start a study from this scenario
      </button>
    </div>
  );
}
