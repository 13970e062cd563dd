// Registers the model tasks (pure fem/ work) so the worker and the inline fallback know them.
export {};
