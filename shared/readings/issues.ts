/** A problem with one field, in the shape the API uses for `issues` (path like "entries.pH.value"). */
export interface ReadingIssue {
  path: string;
  message: string;
}
