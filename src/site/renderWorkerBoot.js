// Worker threads start without the TypeScript loader; register tsx, then load the real worker.
import { register } from 'tsx/esm/api';

register();
await import('./renderWorker.ts');
