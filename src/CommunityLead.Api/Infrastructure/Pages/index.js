import { startPage } from './shell.js';

startPage({ area: 'home', needsKey: false, run: async () => {} });
