/** Version of the analysis engine, stored with every analysis; bump when results can change. */
export const ENGINE_VERSION = '1.0.0'
