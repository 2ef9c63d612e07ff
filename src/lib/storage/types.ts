/** A stored file's metadata (the `stored_files` row in camelCase) as pages show it. */

export interface StoredFileRow {
  id: number;
  storageKey: string;
  originalName: string;
  contentType: string;
  bytes: number;
  sha256: string;
  purpose: string;
  entityType: string | null;
  entityId: string | null;
  uploadedBy: number | null;
  createdAt: Date;
}
