import type { Role } from "@shared/api/teams";

/** The demo team's people (an invented company); the password is printed in the README and on the sign-in page in demo mode. */
export const DEMO_PASSWORD = "loopwright-demo";
export const DEMO_TEAM = "Brightwater Mills — Line 3 drives";
export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: "ines.okafor@brightwater.example", name: "Ines Okafor", role: "owner" },
  { email: "tomas.lindqvist@brightwater.example", name: "Tomás Lindqvist", role: "editor" },
  { email: "priya.raman@brightwater.example", name: "Priya Raman", role: "viewer" },
];
