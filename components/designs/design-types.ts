import type { DesignStatus } from "@/components/schemas/design";

/** A design as the list and read routes send it (times as ISO text). */
export interface DesignRow {
  id: string;
  title: string;
  status: DesignStatus;
  createdById: string;
  createdByName: string | null;
  headRevisionId: string | null;
  headNumber: number | null;
  headAuthorName: string | null;
  updatedAt: string;
  createdAt: string;
  deletedAt: string | null;
  /** the head revision's target checks: true all met, false some missed, null no targets, absent not computed */
  checksAllPass?: boolean | null;
  checksMissed?: number;
}

export interface DesignListResponse {
  rows: DesignRow[];
  total: number;
  page: number;
  pageSize: number;
  authors: { id: string; name: string | null }[];
}

/** Conflict detail of a stale save (409). */
export interface HeadConflict {
  headRevisionId: string;
  headNumber: number;
  authorName: string | null;
  savedAt: string;
}
