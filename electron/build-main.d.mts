/** Types for build-main.mjs (plain JavaScript so `npm start` needs no TypeScript loader). */
export declare const ROOT: string;
export declare function buildElectron(options?: { root?: string; outDir?: string; minify?: boolean }): Promise<string>;
