// Test stand-in for the analysis worker: keeps allocating JS objects until V8's heap limit
// (worker resourceLimits) stops it. Plain JS so the runner starts it without a loader.
const kept = [];
for (;;) kept.push({ a: new Array(1000).fill(kept.length), b: String(kept.length).repeat(20) });
