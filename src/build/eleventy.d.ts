// The few parts of Eleventy's programmatic API the build uses (the package ships no types).
declare module "@11ty/eleventy" {
  export default class Eleventy {
    constructor(
      input: string,
      output: string,
      options?: { configPath?: string; quietMode?: boolean; config?: (eleventyConfig: { addGlobalData(name: string, value: unknown): void }) => void },
    );
    write(): Promise<unknown>;
  }
}

// The part of Nunjucks' API the species-page renderer uses (the package ships no types).
declare module "nunjucks" {
  export class FileSystemLoader {
    constructor(searchPaths: string | string[]);
  }
  export class Environment {
    constructor(loader: FileSystemLoader, opts?: { autoescape?: boolean; throwOnUndefined?: boolean });
    addFilter(name: string, fn: (...args: unknown[]) => unknown): void;
    render(name: string, context: Record<string, unknown>): string;
  }
  const nunjucks: { Environment: typeof Environment; FileSystemLoader: typeof FileSystemLoader };
  export default nunjucks;
}
