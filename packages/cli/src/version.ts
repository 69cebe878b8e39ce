/** Version of the command, kept equal to packages/cli/package.json "version" (checked by a test). */
export const VERSION = '0.1.0';
