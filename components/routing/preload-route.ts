// Native bundles hold every route already (async routes are web only): nothing to fetch ahead.
export {};
