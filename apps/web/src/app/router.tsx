import { createBrowserRouter, Navigate, type RouteObject } from 'react-router-dom';
import { AppLayoutRoute } from './routes/app-layout-route';
import { MissionRoute } from './routes/mission-route';
import { MissionsRoute } from './routes/missions-route';
import { NotFoundRoute } from './routes/not-found-route';
import { RouteError } from './routes/route-error';
import { SignInRoute } from './routes/sign-in-route';

/** The route table; tests mount it in a memory router. */
export const routes: RouteObject[] = [
  { path: '/sign-in', element: <SignInRoute />, errorElement: <RouteError /> },
  {
    path: '/',
    element: <AppLayoutRoute />,
    errorElement: <RouteError />,
    children: [
      {
        // Keeps the shell on screen when a page fails.
        errorElement: <RouteError />,
        children: [
          { index: true, element: <Navigate to="/missions" replace /> },
          { path: 'missions', element: <MissionsRoute /> },
          { path: 'missions/:missionId', element: <MissionRoute /> },
          { path: '*', element: <NotFoundRoute /> },
        ],
      },
    ],
  },
];

/** The browser router of the app. */
export function createAppRouter() {
  return createBrowserRouter(routes);
}
