/**
 * A file name for a job's document download: the job's name in lowercase letters and digits
 * joined by hyphens (no path separators, quotes or control characters can reach the header).
 */
export function documentFileName(jobName: string): string {
  const slug = jobName
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 80)
    .replace(/-+$/, '');
  return `${slug || 'job'}.borewright.json`;
}
