/// <reference types="astro/client" />

declare namespace App {
  interface Locals {
    /** Short id for this request, logged with unexpected errors and returned in their JSON. */
    requestId: string;
    /** Who is asking: anonymous, an account with a role, or a student class session. */
    actor: import('./lib/auth/actor').Actor;
  }
}
