/** Most samples one path may have, whether sampled from a formula or imported. */
export const MAX_PATH_SAMPLES = 1_000_000;
