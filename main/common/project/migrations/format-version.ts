/** The file format this build writes, and the newest version it reads. */
export const PROJECT_FORMAT = 'stayset-project';
export const CURRENT_FORMAT_VERSION = 2;
