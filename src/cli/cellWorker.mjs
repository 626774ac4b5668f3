// Worker-thread entry: load TypeScript through tsx, then serve cells (see cellWorker.ts).
import { register } from 'tsx/esm/api';

register();
await import('./cellWorker.ts');
