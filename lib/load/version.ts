/**
 * The engine version every result carries. 0.2.0: engine split; the handbook's residential
 * load-factor procedure beside the hourly method; heat storage, slab credit and temperature swing in
 * the hourly method; no duct latent gain without a published source; direct U-factor and
 * leakage-area inputs; slab F-factors from HoF 2021 ch. 18 Table 24.
 */
export const ENGINE_VERSION = "0.2.0";
