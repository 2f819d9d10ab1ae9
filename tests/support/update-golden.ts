/** Golden-file tests rewrite their stored results only when run with UPDATE_GOLDEN=1. */
export const UPDATE_GOLDEN = process.env.UPDATE_GOLDEN === "1";
