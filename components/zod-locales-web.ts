// zod's languages on the web: English only (see metro.config.js, which puts this file in place
// of zod's own list of every language when building the web app).
export { default as en } from 'zod/v4/locales/en.js';
