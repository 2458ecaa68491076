// The static HTML report.
export { renderHtmlReport, REPORT_CSP } from './report-html';
export { escapeHtml } from './escape-html';
export { histogramSvg, barChartSvg } from './svg-charts';
