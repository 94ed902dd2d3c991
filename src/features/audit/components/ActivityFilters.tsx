import type { ChangeEvent } from "react";
import { AUDIT_KINDS, type AuditKind } from "@shared/api/audit";
import { SelectField } from "@/components/Field";
import type { AuditFilters } from "@/features/audit/api/getAuditEvents";
import { AUDIT_KIND_VIEWS } from "@/features/audit/components/auditKindViews";

export interface FilterChoices {
  people: { id: string; name: string }[];
  diagrams: { id: string; title: string; archived: boolean }[];
}

interface Props extends FilterChoices {
  filters: AuditFilters;
  onChange: (next: AuditFilters) => void;
}

/** Person, kind and diagram selects; "everyone / every kind / every diagram" filters nothing. */
export function ActivityFilters({ filters, onChange, people, diagrams }: Props) {
  const set = (key: keyof AuditFilters) => (ev: ChangeEvent<HTMLSelectElement>) =>
    onChange({ ...filters, [key]: ev.target.value || undefined });
  return (
    <div role="group" aria-label="Filter activity" className="mb-4 grid gap-3 sm:grid-cols-3">
      <SelectField label="Person" value={filters.actor ?? ""} onChange={set("actor")}>
        <option value="">Everyone</option>
        {people.map((p) => (
          <option key={p.id} value={p.id}>{p.name}</option>
        ))}
      </SelectField>
      <SelectField label="Kind" value={filters.kind ?? ""} onChange={set("kind")}>
        <option value="">Every kind</option>
        {AUDIT_KINDS.map((k: AuditKind) => (
          <option key={k} value={k}>{AUDIT_KIND_VIEWS[k].name}</option>
        ))}
      </SelectField>
      <SelectField label="Diagram" value={filters.diagram ?? ""} onChange={set("diagram")}>
        <option value="">Every diagram</option>
        {diagrams.map((d) => (
          <option key={d.id} value={d.id}>{d.archived ? `${d.title} (archived)` : d.title}</option>
        ))}
      </SelectField>
    </div>
  );
}
