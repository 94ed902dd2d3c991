const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: "medium", timeStyle: "short" });
const date = new Intl.DateTimeFormat(undefined, { dateStyle: "medium" });

/** Formats an ISO timestamp from the API for tables; bad input shows as given rather than "Invalid Date". */
export const formatDateTime = (iso: string): string => {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : dateTime.format(d);
};

export const formatDate = (iso: string): string => {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : date.format(d);
};

export const roleLabel = (role: string): string => role.charAt(0).toUpperCase() + role.slice(1);
