import packageJson from '../package.json' with { type: 'json' };

/** The tool's name and version as the package declares them; reports and replays carry them. */
export const TOOL_NAME = 'rmt-assay';
export const TOOL_VERSION: string = packageJson.version;
