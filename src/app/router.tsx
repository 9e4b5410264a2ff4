// The designer app's routes: sign-in, sign-up, invites, the client presentation link in dev, and the
// studio pages inside the designer frame (the room editor in its wide form).
import { createBrowserRouter, Navigate } from 'react-router';
import { DesignerLayout, NotFoundPage } from './layout';
import { ProjectsRoute } from './routes/projects-route';
import { ProjectRoute } from './routes/project-route';
import { RoomRoute } from './routes/room-route';
import { SignInPage } from '../features/auth/components/sign-in-page';
import { SignUpPage } from '../features/auth/components/sign-up-page';
import { AcceptInvitePage } from '../features/auth/components/accept-invite-page';
import { ClientsPage } from '../features/clients/components/clients-page';
import { StudioPage } from '../features/studio/components/studio-page';
import { OutboxPage } from '../features/outbox/components/outbox-page';
import { FinishLibraryPage } from '../features/finishes/components/finish-library-page';
import { FinishRoute } from './routes/finishes-route';
import { ModelLibraryPage } from '../features/models/components/model-library-page';
import { ModelRoute } from './routes/models-route';
import { ScheduleRoute, TakeoffRoute } from './routes/schedules-route';

export const router = createBrowserRouter([
  { path: '/sign-in', element: <SignInPage /> },
  { path: '/sign-up', element: <SignUpPage /> },
  { path: '/invite/:token', element: <AcceptInvitePage /> },
  // Built pages serve /p/* from the presentation entry; this lazy route covers the dev server.
  { path: '/p/:token', lazy: () => import('../features/client-page/presentation-route') },
  {
    element: <DesignerLayout />,
    children: [
      { path: '/', element: <Navigate to="/projects" replace /> },
      { path: '/projects', element: <ProjectsRoute /> },
      { path: '/projects/:projectId', element: <ProjectRoute /> },
      { path: '/projects/:projectId/take-off', element: <TakeoffRoute /> },
      { path: '/projects/:projectId/rooms/:roomId/options/:optionId/schedule', element: <ScheduleRoute /> },
      { path: '/clients', element: <ClientsPage /> },
      { path: '/finishes', element: <FinishLibraryPage /> },
      { path: '/finishes/:finishId', element: <FinishRoute /> },
      { path: '/models', element: <ModelLibraryPage /> },
      { path: '/models/:modelId', element: <ModelRoute /> },
      { path: '/studio', element: <StudioPage /> },
      { path: '/outbox', element: <OutboxPage /> },
      { path: '/outbox/:messageId', element: <OutboxPage /> },
    ],
  },
  {
    element: <DesignerLayout wide />,
    children: [{ path: '/projects/:projectId/rooms/:roomId', element: <RoomRoute /> }],
  },
  { path: '*', element: <NotFoundPage /> },
]);
