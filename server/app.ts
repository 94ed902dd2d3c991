import express, { type Express } from "express";
import helmet from "helmet";
import { existsSync } from "node:fs";
import { join, resolve } from "node:path";
import type { Logger } from "pino";
import type { Sequelize } from "sequelize";
import type { AppLucia } from "@server/auth/lucia";
import type { Config } from "@server/config";
import { teamAuditRouter } from "@server/features/audit/router";
import { authRouter } from "@server/features/auth/router";
import { commentsRouter } from "@server/features/comments/router";
import { diagramsRouter, teamDiagramsRouter } from "@server/features/diagrams/router";
import { invitationLinkRouter, teamInvitationsRouter } from "@server/features/invitations/router";
import { systemRouter } from "@server/features/system/router";
import { capabilityHeaders } from "@server/features/shareLinks/headers";
import { sharePage } from "@server/features/shareLinks/page";
import { diagramShareLinksRouter, sharedLinkRouter, teamShareLinksRouter } from "@server/features/shareLinks/router";
import { teamsRouter } from "@server/features/teams/router";
import { versionsRouter } from "@server/features/versions/router";
import { versionImportRouter } from "@server/features/versions/importRouter";
import { exportRouter, sharedExportRouter } from "@server/features/export/router";
import { createSaveCheck, type SaveCheck } from "@server/features/versions/check";
import { clientPages } from "@server/http/clientPages";
import { originCheck } from "@server/http/csrf";
import { errorHandler, unknownApiRoute } from "@server/http/errors";
import { authLimiter, shareLookupLimiter, uploadLimiter } from "@server/http/rateLimit";
import { requestLog } from "@server/http/requestLog";
import { sessionMiddleware } from "@server/http/session";
import { paths } from "@shared/routes";
import type { FakeMailService } from "@server/mail/fakeMailService";
import { mailboxPage } from "@server/mail/mailboxPage";
import type { Mailer } from "@server/mail/mailer";

export interface AppDeps {
  config: Config;
  sequelize: Sequelize;
  lucia: AppLucia;
  mailer: Mailer;
  mailbox: FakeMailService | null;
  log: Logger;
  /** The check of versions on save; by default one with the default budget (createSaveCheck). */
  saveCheck?: SaveCheck;
}

/** The HTTP application: /api/*, the dev mailbox while the fake mail service runs, and the built client. */
export function createApp(deps: AppDeps): Express {
  const { config, log } = deps;
  const https = config.publicUrl.startsWith("https://");
  const app = express();
  app.disable("x-powered-by");
  app.set("etag", false); // API answers are per-user and live: never a 304 from a stale validator
  app.set("trust proxy", "loopback");
  app.use(
    helmet({
      hsts: https,
      // Only this origin: helmet's defaults also allow styles and fonts from any https origin, which the app never needs
      // (its fonts are bundled). Inline styles stay: the canvas, plots and typeset formulas position by style attribute.
      contentSecurityPolicy: {
        directives: {
          "style-src": ["'self'", "'unsafe-inline'"],
          "font-src": ["'self'", "data:"],
          "img-src": ["'self'", "data:", "blob:"],
          "upgrade-insecure-requests": https ? [] : null,
        },
      },
    }),
  );

  const limiter = authLimiter(config.authRateLimit);
  const saveCheck = deps.saveCheck ?? createSaveCheck({ log });
  const api = express.Router();
  api.use(requestLog(log));
  api.use((_req, res, next) => (res.set("Cache-Control", "no-store"), next()));
  api.use(express.json({ limit: "4mb" }));
  api.use(originCheck(config.publicUrl));
  api.use(sessionMiddleware(deps.lucia));
  api.use(systemRouter({ sequelize: deps.sequelize, mailbox: deps.mailbox, demo: config.demo }));
  api.post(["/teams/:teamId/diagrams/import", "/diagrams/:id/versions/import"], uploadLimiter(config.uploadRateLimit));
  api.use("/auth", authRouter(deps.lucia, limiter));
  api.use("/teams", teamsRouter(), teamInvitationsRouter({ mailer: deps.mailer, publicUrl: config.publicUrl }, limiter), teamDiagramsRouter(saveCheck), teamShareLinksRouter());
  api.use("/teams", teamAuditRouter());
  api.use("/invitations", invitationLinkRouter(limiter));
  api.use("/diagrams", diagramsRouter(), versionsRouter(saveCheck), versionImportRouter(saveCheck), exportRouter(), diagramShareLinksRouter({ publicUrl: config.publicUrl }));
  api.use("/shared", shareLookupLimiter(config.shareRateLimit), capabilityHeaders, sharedExportRouter(), sharedLinkRouter());
  api.use("/diagrams", commentsRouter({ mailer: deps.mailer, publicUrl: config.publicUrl, log }));
  api.use(unknownApiRoute);
  app.use("/api", api);

  if (deps.mailbox) {
    const mailbox = deps.mailbox;
    app.get("/dev/mailbox", (_req, res) => void res.type("html").send(mailboxPage(mailbox.messages)));
  }

  const clientDir = resolve(config.clientDir);
  const page = existsSync(join(clientDir, "index.html")) ? clientPages(clientDir) : null;
  // A share link's page: its token is checked (404/410) before any page is sent.
  app.use("/s/", requestLog(log), capabilityHeaders);
  app.get(paths.share, sharePage(page));
  if (page) {
    app.use(express.static(clientDir, { index: false, maxAge: "1h" }));
    // SPA fallback: every other GET that wants HTML gets the client, which routes it.
    app.get(/^\/(?!api\/|dev\/).*/, (req, res, next) =>
      req.accepts("html") ? void res.type("html").set("Cache-Control", "no-cache").send(page(req.path)) : next(),
    );
  }
  app.use(errorHandler(log));
  return app;
}
