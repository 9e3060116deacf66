import type { DataActionName } from '../../../core/api/method-names';

/** What the bar says while a data action runs, on the Data screen and for the File menu's actions alike. */
export const runningLabels: Record<DataActionName, string> = {
  backup: 'Backing up…',
  restore: 'Restoring…',
  exportJobs: 'Exporting…',
  importJobs: 'Importing…',
};
