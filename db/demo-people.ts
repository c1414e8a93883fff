/**
 * The demo scenario: Larkfield Acoustics, an invented maker of studio condenser microphones, and its people.
 * Every name here is invented. `npm start` prints these sign-ins and the README lists them.
 */
export const DEMO_PASSWORD = "bench-demo-2026";

export const DEMO_WORKSPACE = { slug: "larkfield", name: "Larkfield Acoustics" } as const;

export const DEMO_PEOPLE = [
  { email: "orla@larkfield.example", name: "Orla Penhallow", role: "owner" },
  { email: "tomas@larkfield.example", name: "Tomas Reyne", role: "designer" },
  { email: "ines@larkfield.example", name: "Ines Caldero", role: "designer" },
  { email: "margit@larkfield.example", name: "Margit Solberg", role: "reviewer" },
  { email: "felix@larkfield.example", name: "Felix Amberley", role: "viewer" },
] as const;

/** Someone the demo owner has invited but who has not joined yet (the seed keeps one open invitation for them). */
export const DEMO_PENDING_INVITATION = { email: "wendel@larkfield.example", role: "reviewer" } as const;
