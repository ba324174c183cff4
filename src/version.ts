/** The fincheck version printed in reports and by the command line (kept in step with package.json by a test). */
export const VERSION = '0.1.0';
