import type { RouteObject } from 'react-router';
import { PageSkeleton } from '@/components/ui';
import { RequireRole } from '@/features/auth/components/RequireRole';
import { SignedInLayout } from './layout/SignedInLayout';
import { EditorSkeleton } from '@/components/ui/EditorSkeleton';
import { HomeRedirect } from './routes/HomeRedirect';
import { RouteErrorBoundary } from './routes/RouteErrorBoundary';
import { lazyPage } from './routes/pages';

const pageSkeleton = <PageSkeleton />;

// Every page is its own chunk; the editor's carries three.js and loads only at /designs/:designId.
const SignInPage = lazyPage(() => import('@/features/auth/components/SignInPage'), pageSkeleton);
const DesignsPage = lazyPage(() => import('@/features/designs/components/DesignsPage'), pageSkeleton);
const EditorRoute = lazyPage(() => import('@/features/editor/EditorRoute'), <EditorSkeleton />);
// The read-only viewer: the shared viewer layer without the editor's code.
const ViewerRoute = lazyPage(() => import('@/features/viewer/ViewerRoute'), <EditorSkeleton label="Opening the viewer…" />);
const PeoplePage = lazyPage(() => import('@/features/people/components/PeoplePage'), pageSkeleton);
const AccountPage = lazyPage(() => import('@/features/account/components/AccountPage'), pageSkeleton);
const WorkbenchPage = lazyPage(() => import('@/features/workbench/components/WorkbenchPage'), pageSkeleton);
const BuildPage = lazyPage(() => import('@/features/workbench/components/BuildPage'), pageSkeleton);
const PrintInstructionsPage = lazyPage(() => import('@/features/workbench/components/PrintInstructionsPage'), pageSkeleton);
const PieceLabelsPage = lazyPage(() => import('@/features/workbench/components/PieceLabelsPage'), pageSkeleton);
const ReviewsPage = lazyPage(() => import('@/features/reviews/components/ReviewsPage'), pageSkeleton);
const ClassesPage = lazyPage(() => import('@/features/classes/components/ClassesPage'), pageSkeleton);
const ForgotPasswordPage = lazyPage(() => import('@/features/auth/components/ForgotPasswordPage'), pageSkeleton);
const ResetPasswordPage = lazyPage(() => import('@/features/auth/components/ResetPasswordPage'), pageSkeleton);
const LinkViewerPage = lazyPage(() => import('@/features/linkViewer/components/LinkViewerPage'), <EditorSkeleton />);
const ReviewPage = lazyPage(() => import('@/features/reviews/components/ReviewPage'), <EditorSkeleton />);
const OutboxPage = lazyPage(() => import('@/features/outbox/components/OutboxPage'), pageSkeleton);
const DesignHistoryPage = lazyPage(() => import('@/features/designs/components/DesignHistoryPage'), pageSkeleton);
const NotFoundPage = lazyPage(() => import('./routes/NotFoundPage'), pageSkeleton);

/** Route tree per the client-routes contract. Guards (RequireRole) sit above the pages they protect. */
export const routes: RouteObject[] = [
  {
    id: 'root',
    errorElement: <RouteErrorBoundary />,
    children: [
      { path: '/sign-in', Component: SignInPage },
      { path: '/forgot-password', Component: ForgotPasswordPage },
      { path: '/reset-password', Component: ResetPasswordPage },
      // Read-only links: no sign-in.
      { path: '/view/:token', Component: LinkViewerPage },
      {
        element: <RequireRole />,
        children: [
          {
            element: <SignedInLayout />,
            children: [
              {
                errorElement: <RouteErrorBoundary />,
                children: [
                  { index: true, element: <HomeRedirect /> },
                  { path: 'designs', element: <RequireRole roles={['owner', 'designer']} />, children: [{ index: true, Component: DesignsPage }] },
                  { path: 'designs/:designId/history', element: <RequireRole roles={['owner', 'designer']} />, children: [{ index: true, Component: DesignHistoryPage }] },
                  { path: 'outbox', element: <RequireRole roles={['owner']} />, children: [{ index: true, Component: OutboxPage }] },
                  { path: 'people', element: <RequireRole roles={['owner']} />, children: [{ index: true, Component: PeoplePage }] },
                  { path: 'account', Component: AccountPage },
                  { path: 'workbench', element: <RequireRole roles={['builder']} />, children: [{ index: true, Component: WorkbenchPage }] },
                  // Builders work on a build; owners and designers open it to watch progress (their ticks are refused).
                  { path: 'workbench/builds/:buildId', element: <RequireRole roles={['builder', 'owner', 'designer']} />, children: [{ index: true, Component: BuildPage }] },
                  { path: 'reviews', element: <RequireRole roles={['customer']} />, children: [{ index: true, Component: ReviewsPage }] },
                  { path: 'reviews/:designId', element: <RequireRole roles={['customer', 'owner', 'designer']} />, children: [{ index: true, Component: ReviewPage }] },
                  { path: 'classes', element: <RequireRole roles={['instructor']} />, children: [{ index: true, Component: ClassesPage }] },
                  { path: '*', Component: NotFoundPage },
                ],
              },
            ],
          },
          {
            // Printable pages: no navigation around them.
            path: 'workbench/builds/:buildId',
            element: <RequireRole roles={['builder', 'owner', 'designer']} />,
            errorElement: <RouteErrorBoundary />,
            children: [
              { path: 'print', Component: PrintInstructionsPage },
              { path: 'labels', Component: PieceLabelsPage },
            ],
          },
          {
            element: <SignedInLayout compact />,
            children: [
              {
                errorElement: <RouteErrorBoundary />,
                children: [
                  {
                    path: 'designs/:designId',
                    element: <RequireRole roles={['owner', 'designer']} />,
                    children: [
                      { index: true, Component: EditorRoute },
                      { path: 'view', Component: ViewerRoute },
                    ],
                  },
                ],
              },
            ],
          },
        ],
      },
    ],
  },
];
