import { request, type BrowserContextOptions } from "@playwright/test";
import type { DiagramDocument } from "@shared/diagram/schema";

export interface SeededDiagram {
  id: string;
  teamId: string;
  /** The signed-in session, for a browser context or (its cookies) a Cookie header. */
  storageState: NonNullable<Exclude<BrowserContextOptions["storageState"], string>>;
}

/** A fresh user, team and diagram with `document` as version 1, through the real API. */
export async function seedDiagram(baseUrl: string, document: DiagramDocument, title: string): Promise<SeededDiagram> {
  const api = await request.newContext({ baseURL: baseUrl, extraHTTPHeaders: { Origin: baseUrl } });
  try {
    const post = async (path: string, data: unknown) => {
      const res = await api.post(path, { data });
      if (!res.ok()) throw new Error(`POST ${path} answered ${res.status()}: ${(await res.text()).slice(0, 300)}`);
      return res.json();
    };
    const email = `bench.${Date.now()}.${Math.floor(Math.random() * 1e6)}@bench.loopwright.test`;
    await post("/api/auth/sign-up", { name: "Bench Runner", email, password: "bench-password-42" });
    const { team } = await post("/api/teams", { name: `Bench ${Date.now()}` });
    const { diagram } = await post(`/api/teams/${team.id}/diagrams`, { title });
    await post(`/api/diagrams/${diagram.id}/versions`, { baseVersion: 0, message: "Generated for a benchmark", document });
    return { id: diagram.id, teamId: team.id, storageState: await api.storageState() };
  } finally {
    await api.dispose();
  }
}
