// The few parts of Eleventy's programmatic API the build command uses (the package ships no types).
declare module "@11ty/eleventy" {
  export default class Eleventy {
    constructor(input: string, output: string, options?: { configPath?: string; quietMode?: boolean });
    write(): Promise<unknown>;
  }
}
