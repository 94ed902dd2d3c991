import { existsSync, readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { DIAGRAM_PAGE_MODULE, fillPath, href, matchRoute, paths, safeNext } from "@shared/routes";

describe("the route table", () => {
  it("fills and matches the same patterns, encoding and decoding segments", () => {
    expect(href.members("t 1")).toBe("/teams/t%201/members");
    expect(fillPath(paths.diagram, { id: "42" })).toBe("/diagrams/42");
    expect(matchRoute(paths.diagram, "/diagrams/42")).toEqual({ id: "42" });
    expect(matchRoute(paths.diagram, "/diagrams/42/")).toEqual({ id: "42" });
    expect(matchRoute(paths.members, href.members("t 1"))).toEqual({ teamId: "t 1" });
    expect(href.sheet("42", 3)).toBe("/diagrams/42/versions/3/sheet");
    expect(matchRoute(paths.sheet, href.sheet("a b", 3))).toEqual({ id: "a b", n: "3" });
  });

  it("matches nothing else: other depths, other prefixes, malformed escapes", () => {
    expect(matchRoute(paths.diagram, "/diagrams")).toBeNull();
    expect(matchRoute(paths.diagram, "/diagrams/42/steps")).toBeNull();
    expect(matchRoute(paths.team, "/teams/1/members")).toBeNull();
    expect(matchRoute(paths.diagram, "/x/diagrams/42")).toBeNull();
    expect(matchRoute(paths.diagram, "/diagrams/%E0%A4%A")).toBeNull();
  });

  it("keeps ?next= to same-site paths", () => {
    expect(href.signIn("/diagrams/42")).toBe("/sign-in?next=%2Fdiagrams%2F42");
    expect(href.signIn(paths.home)).toBe(paths.signIn);
    expect(safeNext("//elsewhere.example")).toBe(paths.teams);
    expect(safeNext("/teams/1")).toBe("/teams/1");
  });

  it("names the diagram page's module as the client's lazy route imports it (the key of its chunk in the build manifest)", () => {
    expect(existsSync(DIAGRAM_PAGE_MODULE)).toBe(true);
    const loader = readFileSync("src/app/routes/loadDiagramRoute.ts", "utf8");
    const imported = DIAGRAM_PAGE_MODULE.replace(/^src\//, "@/").replace(/\.tsx$/, "");
    expect(loader).toContain(`import("${imported}")`);
  });
});
