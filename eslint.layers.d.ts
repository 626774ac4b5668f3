/** Types for eslint.layers.js, so the test of the layer map can read it. */
export declare const FORBIDDEN_LAYERS: Readonly<Record<string, readonly string[]>>;
export declare const CORE_ORDER: readonly string[];
export declare const layersRule: object;
