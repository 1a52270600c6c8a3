/** The banners under the top bar: the offer to recover autosaved work, and the status line's notice. */
import type { AutosaveRecord } from "../platform/host";

interface RecoveryProps {
  readonly recovery: AutosaveRecord;
  readonly onRecover: (record: AutosaveRecord) => void;
  readonly onDiscard: () => void;
}

export function RecoveryBanner({ recovery, onRecover, onDiscard }: RecoveryProps) {
  return (
    <div className="banner recovery" role="status">
      Unsaved work from {recovery.savedAt ? new Date(recovery.savedAt).toLocaleString() : "an earlier session"} was
      kept.
      <button type="button" onClick={() => onRecover(recovery)}>
        Recover it
      </button>
      <button type="button" className="link-button" onClick={onDiscard}>
        Discard
      </button>
    </div>
  );
}

export function NoticeBanner({ notice }: { notice: string }) {
  return (
    <div className="banner notice" role="status" data-role="notice">
      {notice}
    </div>
  );
}
