// The few parts of Eleventy's programmatic API we use (the package ships no TypeScript types).
declare module '@11ty/eleventy' {
  export default class Eleventy {
    constructor(
      input: string,
      output: string,
      options?: {
        quietMode?: boolean;
        configPath?: string | false;
        runMode?: 'build' | 'serve' | 'watch';
        config?: (config: never) => void | Promise<void>;
      },
    );
    init(): Promise<void>;
    disableLogger(): void;
    write(): Promise<unknown>;
    watch(): Promise<unknown>;
    serve(port?: number): Promise<void>;
    stopWatch(): Promise<void>;
  }
}
