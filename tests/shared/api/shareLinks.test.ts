import { describe, expect, it } from "vitest";
import { createShareLinkSchema, MAX_SHARE_LINK_DAYS, shareLinkState } from "@shared/api/shareLinks";

describe("the share-link contract", () => {
  it("reads a missing version or expiry as latest / never, and refuses what is not a positive whole number (common practice)", () => {
    expect(createShareLinkSchema.parse({})).toEqual({ version: null, expiresInDays: null });
    expect(createShareLinkSchema.parse({ version: 3, expiresInDays: MAX_SHARE_LINK_DAYS })).toEqual({ version: 3, expiresInDays: 365 });
    for (const body of [{ version: 0 }, { version: 2.5 }, { version: "2" }, { expiresInDays: 0 }, { expiresInDays: 366 }, { expiresInDays: Number.NaN }])
      expect(createShareLinkSchema.safeParse(body).success, JSON.stringify(body)).toBe(false);
  });

  it("tells an active link from a revoked or an expired one, revoked first", () => {
    const now = Date.parse("2026-12-03T08:00:00Z");
    expect(shareLinkState({ expiresAt: null, revokedAt: null }, now)).toBe("active");
    expect(shareLinkState({ expiresAt: "2026-12-04T00:00:00Z", revokedAt: null }, now)).toBe("active");
    expect(shareLinkState({ expiresAt: "2026-12-03T08:00:00Z", revokedAt: null }, now)).toBe("expired");
    expect(shareLinkState({ expiresAt: "2026-12-01T00:00:00Z", revokedAt: "2026-11-30T00:00:00Z" }, now)).toBe("revoked");
  });
});
