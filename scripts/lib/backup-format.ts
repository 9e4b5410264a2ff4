// The backup archive's layout: database.dump (pg_dump custom format), files/<storage key>,
// presentation-key (when the instance had one in DATA_DIR) and manifest.json (this shape).
export const BACKUP_FORMAT = 'parlour-backup';
export const BACKUP_VERSION = 1;
export const PRESENTATION_KEY_FILE = 'presentation-key';

export interface BackupManifest {
  format: typeof BACKUP_FORMAT;
  version: typeof BACKUP_VERSION;
  createdAt: string;
  /** Rows per table when the backup was taken. */
  rows: Record<string, number>;
  files: number;
  fileBytes: number;
  presentationKey: boolean;
}
