/** Units and sources named in the moisture trace (ISO 13788:2012). */
export const RK = 'm²·K/W';
export const M = 'm';
export const PA = 'Pa';
export const KGM2 = 'kg/m²';
export const ONE = '1';

export const SRC_SURFACE_R = 'ISO 6946:2017 Table 7, as used by ISO 13788:2012 §6';
export const SRC_LAYER_R = 'ISO 6946:2017 (layer, air-layer and declared resistances)';
export const SRC_SD = 'ISO 13788:2012 §3: s_d = μ·d; s_d = δ₀/W';
export const SRC_INTERIOR = 'ISO 13788:2012 Annex A (internal humidity classes, factor 1.10)';
export const SRC_GLASER = 'ISO 13788:2012 §6 (monthly Glaser balance)';
export const SRC_START = 'ISO 13788:2012 §6 (starting month)';
export const SRC_SURFACE = 'ISO 13788:2012 §5 (critical surface humidity 80 %, Rsi = 0.25 m²·K/W)';
