// Piscina worker entry: registers the TypeScript loader in this thread, then serves sweep batches.
import { register } from 'tsx/esm/api';

register();
const task = await import('./sweep-task.ts');
export default task.default;
