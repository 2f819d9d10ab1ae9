/** Engine version stored with every estimate; bump when results change (golden files change). */
export const ENGINE_VERSION = "1.1.0";
