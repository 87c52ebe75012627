// Loaded with `node --import` (or `tsx --import`) by the command-line scripts and the tests' child
// processes. The server modules start with `import 'server-only'`, which Next resolves to nothing on the
// server and to a build error in the browser bundle; plain Node would load the package's default entry,
// which throws. Outside Next there is no browser bundle to protect, so the import resolves to nothing.
import { register } from 'node:module';

register('./server-only-hook.mjs', import.meta.url);
