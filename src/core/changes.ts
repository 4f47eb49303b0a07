/** A file a pull request touches, as git or the pull-request file list reports it. */
export interface ChangedFile {
  status: 'added' | 'modified' | 'renamed' | 'deleted';
  /** Path at head (for deleted files: the path it had at base). */
  path: string;
  /** Path at base when the file was renamed (default: `null`). */
  previousPath: string | null;
}
