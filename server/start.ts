import { buildWeb } from './build-web';
import { main } from './index';

/** `npm start`: export the web app when its sources changed, then run the server in this process. */
try {
  console.log(buildWeb().reason);
} catch (error) {
  console.error(`Cablewright could not start: ${(error as Error).message}`);
  process.exit(1);
}
void main();
