import fc from 'fast-check';

// The default run is reproducible: every property test uses the same seed, so
// a red CI can be replayed exactly. Set FC_SEED to explore other inputs.
fc.configureGlobal({seed: Number(process.env['FC_SEED'] ?? 20261201)});
