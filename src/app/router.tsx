import { lazy } from "react";
import { createBrowserRouter, Navigate } from "react-router-dom";
import { AppShell } from "@/app/layout/AppShell";
import { RequireAuth } from "@/app/RequireAuth";
import { SharedShell } from "@/app/layout/SharedShell";
import { loadDiagramRoute } from "@/app/routes/loadDiagramRoute";
import { RouteError } from "@/app/routes/RouteError";
import { paths } from "@shared/routes";

// Every page is its own chunk, so the first load carries only the shell and the page it shows.
const SignInRoute = lazy(() => import("@/app/routes/SignInRoute").then((m) => ({ default: m.SignInRoute })));
const SignUpRoute = lazy(() => import("@/app/routes/SignUpRoute").then((m) => ({ default: m.SignUpRoute })));
const InviteRoute = lazy(() => import("@/app/routes/InviteRoute").then((m) => ({ default: m.InviteRoute })));
const TeamsRoute = lazy(() => import("@/app/routes/TeamsRoute").then((m) => ({ default: m.TeamsRoute })));
const TeamRoute = lazy(() => import("@/app/routes/TeamRoute").then((m) => ({ default: m.TeamRoute })));
const MembersRoute = lazy(() => import("@/app/routes/MembersRoute").then((m) => ({ default: m.MembersRoute })));
const ActivityRoute = lazy(() => import("@/app/routes/ActivityRoute").then((m) => ({ default: m.ActivityRoute })));
const DiagramRoute = lazy(() => loadDiagramRoute().then((m) => ({ default: m.DiagramRoute })));
const VersionsRoute = lazy(() => import("@/app/routes/VersionsRoute").then((m) => ({ default: m.VersionsRoute })));
const CompareRoute = lazy(() => import("@/app/routes/CompareRoute").then((m) => ({ default: m.CompareRoute })));
const ReviewSheetRoute = lazy(() => import("@/app/routes/ReviewSheetRoute").then((m) => ({ default: m.ReviewSheetRoute })));
const SharedRoute = lazy(() => import("@/app/routes/SharedRoute").then((m) => ({ default: m.SharedRoute })));
const NotFoundRoute = lazy(() => import("@/app/routes/NotFoundRoute").then((m) => ({ default: m.NotFoundRoute })));

export const router = createBrowserRouter([
  // A share link's page stands outside the app's shell: no session, sign-in or team navigation.
  { element: <SharedShell />, errorElement: <RouteError />, children: [{ path: paths.share, element: <SharedRoute /> }] },
  {
    element: <AppShell />,
    errorElement: <RouteError />,
    children: [
      { path: paths.signIn, element: <SignInRoute /> },
      { path: paths.signUp, element: <SignUpRoute /> },
      { path: paths.invite, element: <InviteRoute /> },
      {
        element: <RequireAuth />,
        children: [
          { path: paths.home, element: <Navigate to={paths.teams} replace /> },
          { path: paths.teams, element: <TeamsRoute /> },
          { path: paths.team, element: <TeamRoute /> },
          { path: paths.members, element: <MembersRoute /> },
          { path: paths.activity, element: <ActivityRoute /> },
          { path: paths.diagram, element: <DiagramRoute /> },
          { path: paths.versions, element: <VersionsRoute /> },
          { path: paths.compare, element: <CompareRoute /> },
          { path: paths.sheet, element: <ReviewSheetRoute /> },
        ],
      },
      { path: "*", element: <NotFoundRoute /> },
    ],
  },
]);
