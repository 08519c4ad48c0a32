/** The part of xml2js (0.6.2, which ships no types) that the manifest tests use. */
declare module "xml2js" {
  export interface ParserOptions {
    explicitArray?: boolean;
    explicitChildren?: boolean;
    preserveChildrenOrder?: boolean;
    charsAsChildren?: boolean;
    explicitRoot?: boolean;
  }
  export function parseStringPromise(xml: string, options?: ParserOptions): Promise<unknown>;
}
