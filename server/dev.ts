import { printBanner, startServer } from './index';

const { port, env, seeded } = await startServer();
printBanner(port, env, seeded);
