/** A file name for the download: the project name made safe for file systems, plus the date. */
export function projectFileName(projectName: string, isoDateTime: string): string {
  const safe =
    projectName
      .normalize('NFKD')
      .replace(/[^\w.-]+/g, '-')
      .replace(/^[-.]+|[-.]+$/g, '')
      .slice(0, 60) || 'project';
  return `${safe}-${isoDateTime.slice(0, 10)}.saltsmith.json`;
}
