/// <reference types="astro/client" />

declare namespace App {
  interface Locals {
    /** Short id for this request, logged with unexpected errors and returned in their JSON. */
    requestId: string;
    /** Who is asking: anonymous, an account with a role, or a student class session. */
    actor: import('./lib/auth/actor').Actor;
  }
}

/** The built worker thread entry's file URL; null under the dev server (config/server-entries.mjs). */
declare module 'virtual:kitwright/work-worker' {
  const workerUrl: string | null;
  export default workerUrl;
}
