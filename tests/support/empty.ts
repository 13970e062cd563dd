// Stands in for the 'server-only' marker package, which only resolves under Next's server build.
export {};
