import { generatePath } from "react-router-dom";

/** The route table's paths; the router and every link use these. */
export const paths = {
  home: "/",
  signIn: "/sign-in",
  signUp: "/sign-up",
  invite: "/invite/:token",
  teams: "/teams",
  team: "/teams/:teamId",
  members: "/teams/:teamId/members",
  diagram: "/diagrams/:id",
} as const;

const withNext = (path: string, next?: string) =>
  next && next !== paths.home ? `${path}?${new URLSearchParams({ next })}` : path;

export const href = {
  signIn: (next?: string) => withNext(paths.signIn, next),
  signUp: (next?: string) => withNext(paths.signUp, next),
  invite: (token: string) => generatePath(paths.invite, { token }),
  teams: () => paths.teams,
  team: (teamId: string) => generatePath(paths.team, { teamId }),
  members: (teamId: string) => generatePath(paths.members, { teamId }),
  diagram: (id: string) => generatePath(paths.diagram, { id }),
};

/** Only same-site paths are followed after sign-in, so a crafted ?next= cannot send anyone elsewhere. */
export const safeNext = (next: string | null): string =>
  next && next.startsWith("/") && !next.startsWith("//") && !next.startsWith("/\\") ? next : paths.teams;
