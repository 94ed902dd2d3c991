import { reduceDocument } from "@shared/reduce/reduceDiagram";
import { serveChecks } from "@server/features/versions/serveChecks";

// A long-lived worker: runs the shared reducer on one saved document at a time, off the request thread.
serveChecks(reduceDocument);
