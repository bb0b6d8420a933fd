// Preloaded by the focus benchmarks (node --require): 'server-only' throws outside a React Server Components
// bundle, and the benchmarks run server code directly. Marking it loaded lets that code import it. (The
// react-server condition would do the same but also swap react-dom/server for a stub that refuses to render.)
const marker = require.resolve("server-only");
require.cache[marker] = { id: marker, filename: marker, loaded: true, exports: {} };
