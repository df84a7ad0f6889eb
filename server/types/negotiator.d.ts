// negotiator 0.6 (the version the compression middleware uses) takes a preferred order as a second
// argument, which the published types leave out; only what server/hotReads.ts uses is declared.
declare module 'negotiator' {
  import type { IncomingMessage } from 'node:http';

  class Negotiator {
    constructor(request: IncomingMessage);
    /** The best of `available` for the request's Accept-Encoding; ties go to `preferred`'s order. */
    encoding(available: string[], preferred?: string[]): string | undefined;
  }
  export = Negotiator;
}
