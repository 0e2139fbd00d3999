/** The member tension schedule: model, HTML and CSV builders (pure; runs in main and renderer). */
export * from './schedule-types.ts';
export { buildSchedule, type ScheduleSource, type ScheduleOptions } from './build-schedule.ts';
export { scheduleHtml, scheduleCss, scheduleFragment, escapeHtml } from './schedule-html.ts';
export { scheduleCsv } from './schedule-csv.ts';
