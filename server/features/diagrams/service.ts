import { Op } from "sequelize";
import type { CreateDiagramInput, DiagramDetail, DiagramSummary, UpdateDiagramInput } from "@shared/api/diagrams";
import { createDiagramSchema } from "@shared/api/diagrams";
import type { Role } from "@shared/api/teams";
import { Diagram, DiagramVersion } from "@server/db/models/diagram";
import { Team } from "@server/db/models/team";
import { User } from "@server/db/models/user";
import { recordAudit } from "@server/features/audit/record";
import { notFound } from "@server/http/errors";
import { isUuid } from "@server/http/ids";

type WithCreator = Diagram & { creator?: User };
type VersionWithAuthor = DiagramVersion & { author?: User };

/** Columns a list needs; a diagram's page adds the document. Never the stored result: it can run to megabytes. */
const LIST_COLUMNS = ["id", "diagramId", "number", "createdBy", "createdAt"];
const PAGE_COLUMNS = [...LIST_COLUMNS, "document", "message"];

async function latestVersions(ids: string[], attributes = LIST_COLUMNS): Promise<Map<string, VersionWithAuthor>> {
  const rows = (await DiagramVersion.findAll({
    attributes,
    where: { diagramId: ids },
    include: [{ model: User, as: "author", attributes: ["name"] }],
    order: [["diagramId", "ASC"], ["number", "DESC"]],
  })) as VersionWithAuthor[];
  const latest = new Map<string, VersionWithAuthor>();
  for (const v of rows) if (!latest.has(v.diagramId)) latest.set(v.diagramId, v);
  return latest;
}

function summary(d: WithCreator, latest?: VersionWithAuthor): DiagramSummary {
  const updated = latest && latest.createdAt > d.updatedAt ? latest.createdAt : d.updatedAt;
  return {
    id: d.id,
    teamId: d.teamId,
    title: d.title,
    description: d.description,
    latestVersion: latest?.number ?? null,
    updatedAt: updated.toISOString(),
    author: latest?.author?.name ?? d.creator?.name ?? "",
    archivedAt: d.archivedAt ? d.archivedAt.toISOString() : null,
  };
}

const withCreator = { include: [{ model: User, as: "creator", attributes: ["name"] }] };

export async function listDiagrams(teamId: string, archived: boolean): Promise<DiagramSummary[]> {
  const rows = (await Diagram.findAll({
    where: { teamId, archivedAt: archived ? { [Op.ne]: null } : null },
    ...withCreator,
    order: [["updatedAt", "DESC"]],
  })) as WithCreator[];
  const latest = await latestVersions(rows.map((d) => d.id));
  return rows.map((d) => summary(d, latest.get(d.id))).sort((a, b) => b.updatedAt.localeCompare(a.updatedAt));
}

/**
 * Creates an empty diagram and records it in the trail in the same transaction: as `diagram.created`, or with
 * `from` (the uploaded file's name) as `diagram.imported`.
 */
export async function createDiagram(
  teamId: string,
  userId: string,
  input: CreateDiagramInput,
  from?: { fileName: string },
): Promise<DiagramSummary> {
  const { title, description } = createDiagramSchema.parse(input);
  const d = await Diagram.sequelize!.transaction(async (transaction) => {
    const created = await Diagram.create({ teamId, title, description, createdBy: userId }, { transaction });
    await recordAudit(
      from
        ? { teamId, actorId: userId, kind: "diagram.imported", diagramId: created.id, detail: { title, fileName: from.fileName } }
        : { teamId, actorId: userId, kind: "diagram.created", diagramId: created.id, detail: { title } },
      transaction,
    );
    return created;
  });
  return summary(Object.assign(d, { creator: (await User.findByPk(userId)) ?? undefined }));
}

/** A stored diagram's summary as lists show it, with its latest version. */
export async function summaryOf(d: Diagram): Promise<DiagramSummary> {
  return summary(await (Diagram.findByPk(d.id, withCreator) as Promise<WithCreator>), (await latestVersions([d.id])).get(d.id));
}

/** The diagram row, or a 404 for an unknown or malformed id. */
export async function findDiagram(id: string): Promise<Diagram> {
  const d = isUuid(id) ? await Diagram.findByPk(id) : null;
  if (!d) throw notFound("Diagram not found.");
  return d;
}

export async function diagramDetail(d: Diagram, role: Role): Promise<DiagramDetail> {
  const [full, team, latest] = await Promise.all([
    Diagram.findByPk(d.id, withCreator) as Promise<WithCreator>,
    Team.findByPk(d.teamId),
    latestVersions([d.id], PAGE_COLUMNS).then((m) => m.get(d.id)),
  ]);
  return {
    diagram: { ...summary(full, latest), role, teamName: team?.name ?? "" },
    latestVersion: latest
      ? {
          number: latest.number,
          document: latest.document,
          message: latest.message,
          createdAt: latest.createdAt.toISOString(),
          createdBy: latest.author?.name ?? "",
        }
      : null,
  };
}

export async function updateDiagram(d: Diagram, input: UpdateDiagramInput): Promise<DiagramSummary> {
  if (input.title !== undefined) d.title = input.title;
  if (input.description !== undefined) d.description = input.description;
  await d.save();
  return summaryOf(d);
}

export async function setArchived(d: Diagram, archived: boolean): Promise<DiagramSummary> {
  d.archivedAt = archived ? new Date() : null;
  await d.save();
  return summaryOf(d);
}
