/** app/report behind the ReportPort the services use. */
import { resultsToCsv } from '../../app/report/csv';
import { summaryCsv } from '../../app/report/summaryCsv';
import { loadRecordFonts } from '../../app/report/fonts';
import { renderRecord } from '../../app/report/record';
import { operatingMaps } from '../../app/review/operatingMaps';
import type { ReportPort } from './types';

/** `fontsDir`: the app's assets/fonts (inside app.asar when packaged); default: app/report's own search. */
export function createReportPort(fontsDir?: string): ReportPort {
  return {
    renderRecord: async (review, results, { paper }) => renderRecord(review, results, { paper, maps: operatingMaps(review) ?? [], ...(fontsDir ? { fonts: loadRecordFonts(fontsDir) } : {}) }),
    casesCsv: (results, units) => resultsToCsv(results, units),
    summaryCsv: (results, units) => summaryCsv(results, units),
  };
}
