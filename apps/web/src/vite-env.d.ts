/// <reference types="vite/client" />

interface ImportMetaEnv {
  /** Where the API lives; "/api" on the same origin unless set. */
  readonly VITE_API_BASE_URL?: string;
}

interface ImportMeta {
  readonly env: ImportMetaEnv;
}
