/**
 * The designs pages' names for the shared API client; ApiError keeps the server's `detail` (a 409 names the head
 * revision, who saved it and when).
 */
export { ApiError as DesignApiError, apiFetch as designsFetch } from "@/components/api/client";

export const designsUrl = (workspaceId: string) => `/api/workspaces/${workspaceId}/designs`;
export const designUrl = (workspaceId: string, designId: string) => `${designsUrl(workspaceId)}/${designId}`;
