// The figures thread starts here: TypeScript through tsx's loader, then the thread itself.
import { register } from 'tsx/esm/api';

register();
await import('./figures-thread.ts');
