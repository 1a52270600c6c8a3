/// <reference types="vite/client" />

interface Window {
  /** Scenario JSON text the report printer or a test sets before loading `?capture=3d`. */
  __brinefieldCapture?: string;
}
