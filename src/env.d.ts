/// <reference types="vite/client" />

// Only VITE_* variables reach the client; none are needed yet.
// eslint-disable-next-line @typescript-eslint/no-empty-object-type
interface ImportMetaEnv {}

interface ImportMeta {
  readonly env: ImportMetaEnv;
}
