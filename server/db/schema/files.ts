import { type Generated, type Insertable, type Selectable } from 'kysely';

/** An upload, stored on disk by content hash. */
export interface FilesTable {
  id: Generated<number>;
  studio_id: number;
  sha256: string;
  mime_type: string;
  byte_size: number;
  original_name: string | null;
  width_px: number | null;
  height_px: number | null;
  created_by: string | null;
  created_at: Generated<string>;
}
export type FileRow = Selectable<FilesTable>;
export type NewFileRow = Insertable<FilesTable>;
