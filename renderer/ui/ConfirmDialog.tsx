/** A small modal question with keyboard focus on the safe choice; Escape cancels. */
import { useRef } from "react";
import { useModal } from "./use-modal";

export interface ConfirmRequest {
  readonly title: string;
  readonly message: string;
  readonly confirmLabel: string;
  readonly cancelLabel?: string;
  readonly extraLabel?: string;
  readonly onConfirm: () => void;
  readonly onExtra?: () => void;
}

export function ConfirmDialog({ request, onClose }: { request: ConfirmRequest; onClose: () => void }) {
  const cancelRef = useRef<HTMLButtonElement | null>(null);
  const dialogRef = useModal<HTMLDivElement>(onClose, cancelRef);
  return (
    <div className="modal-backdrop">
      <div
        className="modal"
        role="dialog"
        aria-modal="true"
        aria-labelledby="confirm-title"
        tabIndex={-1}
        ref={dialogRef}
      >
        <h2 id="confirm-title">{request.title}</h2>
        <p>{request.message}</p>
        <div className="button-row end">
          {request.extraLabel && request.onExtra ? (
            <button
              type="button"
              className="primary"
              onClick={() => {
                onClose();
                request.onExtra?.();
              }}
            >
              {request.extraLabel}
            </button>
          ) : null}
          <button
            type="button"
            className="danger"
            onClick={() => {
              onClose();
              request.onConfirm();
            }}
          >
            {request.confirmLabel}
          </button>
          <button type="button" ref={cancelRef} onClick={onClose}>
            {request.cancelLabel ?? "Cancel"}
          </button>
        </div>
      </div>
    </div>
  );
}
