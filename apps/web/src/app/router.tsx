import { lazy, Suspense, type ReactNode } from 'react';
import { createBrowserRouter, Navigate, type RouteObject } from 'react-router-dom';
import { LoadingState } from '../components/ui/loading-state';
import { AppLayoutRoute } from './routes/app-layout-route';
import { MissionRoute } from './routes/mission-route';
import { MissionsRoute } from './routes/missions-route';
import { NotFoundRoute } from './routes/not-found-route';
import { RouteError } from './routes/route-error';
import { SignInRoute } from './routes/sign-in-route';
import { VehicleNewRoute } from './routes/vehicle-new-route';
import { VehicleRoute } from './routes/vehicle-route';
import { VehicleHistoryRoute } from './routes/vehicle-history-route';
import { ScenarioNewRoute } from './routes/scenario-new-route';
import { ScenarioRoute } from './routes/scenario-route';
import { RequirementsRoute } from './routes/requirements-route';
import { RunRoute } from './routes/run-route';
import { MailRoute } from './routes/mail-route';
import { ReviewReportRoute } from './routes/review-report-route';
import { MeshListRoute } from './routes/mesh-list-route';
import { MeshRoute } from './routes/mesh-route';

// The study pages bring srp-core (budget line definitions, requirement margins): loaded with
// the page, not with the app, which keeps srp-core out of the first bundle.
const StudyNewRoute = lazy(() => import('./routes/study-new-route').then((m) => ({ default: m.StudyNewRoute })));
const StudyRoute = lazy(() => import('./routes/study-route').then((m) => ({ default: m.StudyRoute })));
const StudyReportRoute = lazy(() => import('./routes/study-report-route').then((m) => ({ default: m.StudyReportRoute })));

/** A lazily loaded page, with the loading state while its code arrives. */
function lazyPage(page: ReactNode) {
  return <Suspense fallback={<LoadingState label="Loading the page…" />}>{page}</Suspense>;
}

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
          { path: 'missions/:missionId/vehicles/new', element: <VehicleNewRoute /> },
          { path: 'missions/:missionId/vehicles/:vehicleId', element: <VehicleRoute /> },
          { path: 'missions/:missionId/vehicles/:vehicleId/history', element: <VehicleHistoryRoute /> },
          { path: 'missions/:missionId/scenarios/new', element: <ScenarioNewRoute /> },
          { path: 'missions/:missionId/scenarios/:scenarioId', element: <ScenarioRoute /> },
          { path: 'missions/:missionId/requirements', element: <RequirementsRoute /> },
          { path: 'missions/:missionId/runs/:runId', element: <RunRoute /> },
          { path: 'missions/:missionId/runs/:runId/report', element: <ReviewReportRoute /> },
          { path: 'missions/:missionId/studies/new', element: lazyPage(<StudyNewRoute />) },
          { path: 'missions/:missionId/studies/:studyId', element: lazyPage(<StudyRoute />) },
          { path: 'missions/:missionId/studies/:studyId/report', element: lazyPage(<StudyReportRoute />) },
          { path: 'missions/:missionId/meshes', element: <MeshListRoute /> },
          { path: 'missions/:missionId/meshes/:meshId', element: <MeshRoute /> },
          { path: 'admin/mail', element: <MailRoute /> },
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
