// The side panel's words as a reader sees them, rendered to static HTML: a view-only session (share page, an old
// version, a viewer) must not invite changes it cannot make; an editing session still explains how to edit.
import type { ReactNode } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { EditorContext, type EditorActions } from "@/features/editor/components/EditorContext";
import { Connections } from "@/features/editor/components/panels/Connections";
import { ParameterTable } from "@/features/editor/components/panels/ParameterTable";
import { PropertiesPanel } from "@/features/editor/components/panels/PropertiesPanel";
import { docOf, unityLoop } from "../../support";

const session = (readOnly: boolean): EditorActions => ({ act: () => false, readOnly });
const render = (readOnly: boolean, node: ReactNode) => renderToStaticMarkup(<EditorContext.Provider value={session(readOnly)}>{node}</EditorContext.Provider>);
const text = (html: string) => html.replace(/<[^>]+>/g, " ").replace(/&#x27;|&apos;/g, "'").replace(/\s+/g, " ").trim();
const INVITATION = /\b(edit|change|type|add|drag|yet)\b/i;

const noBreak = { used: null, chosen: null, onBreak: () => {} };
const nothingSelected = { blocks: [], wires: [] };

describe("side panel wording in view-only and editing sessions", () => {
  it("with nothing selected: read-only says what selecting shows, and invites nothing", () => {
    const readOnly = text(render(true, <PropertiesPanel doc={unityLoop()} selection={nothingSelected} firstFieldRef={null} analysisBreak={noBreak} />));
    expect(readOnly).toBe("Select a block or a wire to see its details.");
    expect(readOnly).not.toMatch(INVITATION);
    const editing = text(render(false, <PropertiesPanel doc={unityLoop()} selection={nothingSelected} firstFieldRef={null} analysisBreak={noBreak} />));
    expect(editing).toContain("to see and change it");
    expect(editing).toContain("Add blocks from the rail");
  });

  it("a selected block: no edit buttons and no invitation in the words read-only", () => {
    const html = render(true, <PropertiesPanel doc={unityLoop()} selection={{ blocks: ["G"], wires: [] }} firstFieldRef={null} analysisBreak={noBreak} />);
    expect(text(html)).toContain("Transfer function G");
    expect(html).not.toMatch(/>(Duplicate|Delete block)</);
    // The words a reader reads, minus the field labels that name what the block is.
    expect(text(html).replace("Transfer function of s", "")).not.toMatch(/\b(edit|change|type here)\b/i);
  });

  it("an unwired block and an empty parameter table: 'No wires.' and 'no parameters' read-only, 'yet' while editing", () => {
    const lone = docOf([{ id: "k", type: "gain", expr: "2" }]);
    expect(text(render(true, <Connections doc={lone} blockId="k" hasOutput />))).toBe("Wires No wires.");
    expect(text(render(false, <Connections doc={lone} blockId="k" hasOutput />))).toContain("No wires yet.");
    const readOnlyTable = text(render(true, <ParameterTable doc={lone} />));
    expect(readOnlyTable).toBe("This diagram has no parameters.");
    expect(text(render(false, <ParameterTable doc={lone} />))).toContain("No parameters yet.");
  });
});
