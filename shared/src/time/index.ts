export { formatTime } from './format-time.js';
export { officialTime, type OfficialTime } from './official-time.js';
export { parseTime, type ParsedTime } from './parse-time.js';
