/**
 * Files dropped anywhere on the window. Only drags that carry files are taken over: text dragged into a
 * field still drops there. Returns whether a file is being dragged over the window (for the overlay).
 */
import { useEffect, useRef, useState } from "react";

export function useFileDrop(onFile: (file: File) => void): boolean {
  const [dragging, setDragging] = useState(false);
  // Read through a ref so a new callback never re-registers the listeners.
  const onFileRef = useRef(onFile);
  onFileRef.current = onFile;
  useEffect(() => {
    const hasFiles = (e: DragEvent) => e.dataTransfer?.types.includes("Files") ?? false;
    const over = (e: DragEvent) => {
      if (!hasFiles(e)) return;
      e.preventDefault();
      setDragging(true);
    };
    const leave = (e: DragEvent) => {
      if (e.relatedTarget === null) setDragging(false);
    };
    const drop = (e: DragEvent) => {
      setDragging(false);
      if (!hasFiles(e)) return;
      e.preventDefault(); // never let the browser navigate to the dropped file
      const file = e.dataTransfer?.files[0];
      if (file) onFileRef.current(file);
    };
    window.addEventListener("dragover", over);
    window.addEventListener("dragleave", leave);
    window.addEventListener("drop", drop);
    return () => {
      window.removeEventListener("dragover", over);
      window.removeEventListener("dragleave", leave);
      window.removeEventListener("drop", drop);
    };
  }, []);
  return dragging;
}
