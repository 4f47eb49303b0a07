/** The tool's version, reported in JSON and SARIF (kept equal to package.json by a test). */
export const VERSION = '1.0.0';
