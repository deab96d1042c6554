import { createBrowserRouter } from 'react-router';

import { routeTree } from './route-tree.js';

export const router = createBrowserRouter(routeTree);
