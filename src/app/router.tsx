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
const ReviewsPage = lazyPage(() => import('@/features/reviews/components/ReviewsPage'), pageSkeleton);
const ClassesPage = lazyPage(() => import('@/features/classes/components/ClassesPage'), pageSkeleton);
const NotFoundPage = lazyPage(() => import('./routes/NotFoundPage'), pageSkeleton);

/** Route tree per the client-routes contract. Guards (RequireRole) sit above the pages they protect. */
export const routes: RouteObject[] = [
  {
    id: 'root',
    errorElement: <RouteErrorBoundary />,
    children: [
      { path: '/sign-in', Component: SignInPage },
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
                  { path: 'people', element: <RequireRole roles={['owner']} />, children: [{ index: true, Component: PeoplePage }] },
                  { path: 'account', Component: AccountPage },
                  { path: 'workbench', element: <RequireRole roles={['builder']} />, children: [{ index: true, Component: WorkbenchPage }] },
                  { path: 'reviews', element: <RequireRole roles={['customer']} />, children: [{ index: true, Component: ReviewsPage }] },
                  { path: 'classes', element: <RequireRole roles={['instructor']} />, children: [{ index: true, Component: ClassesPage }] },
                  { path: '*', Component: NotFoundPage },
                ],
              },
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
