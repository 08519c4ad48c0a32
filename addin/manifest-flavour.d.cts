/** Types for manifest-flavour.cjs (the build's manifest rewrite), used by the tests. */
export interface ManifestIdentity {
  readonly id: string;
  readonly displayName: string;
  readonly namespace: string;
  readonly groupLabel: string;
}
export declare const DEV_ORIGIN: string;
export declare const DEV_PORT: number;
export declare const RELEASE: ManifestIdentity;
export declare const DEV: ManifestIdentity;
export declare function flavourManifest(xml: string, options: { flavour: "release" | "dev"; origin?: string }): string;
export declare function normaliseOrigin(origin: string): string;
