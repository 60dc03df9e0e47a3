import type { ComponentType } from 'react';
import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { LoadingState } from '@/components/query-state';
import { SignInPage } from '@/features/auth/components/sign-in-page';
import { ForgotPasswordPage } from '@/features/auth/components/forgot-password-page';
import { SetPasswordPage } from '@/features/auth/components/set-password-page';
import { ChangePasswordPage } from '@/features/auth/components/change-password-page';
import { ProtectedLayout, type RoleNavItem } from '@/features/auth/components/protected-layout';
import { RequirePermission } from '@/features/auth/components/require-permission';
import { UsersPage } from '@/features/users/components/users-page';
import { AuditPage } from '@/features/audit/components/audit-page';
import { MailOutboxPage } from '@/features/mail/components/mail-outbox-page';
import { HomeRoute } from './routes/home';
import { NotFoundRoute } from './routes/not-found';

/**
 * Main navigation; each link shows only for roles that may do its action. The server
 * refuses what a role may not do whether or not a link shows.
 */
const nav: RoleNavItem[] = [
  { to: '/', label: 'Overview', action: 'data.read' },
  { to: '/sites', label: 'Sites', action: 'data.read' },
  { to: '/profiles', label: 'Profiles', action: 'data.read' },
  { to: '/plans', label: 'Plans', action: 'data.read' },
  { to: '/studies', label: 'Studies', action: 'data.read' },
  { to: '/sign-off', label: 'Sign-off', action: 'plans.approve' },
  { to: '/users', label: 'Users', action: 'users.manage' },
  { to: '/audit', label: 'Audit', action: 'audit.read' },
  { to: '/mail', label: 'Mail outbox', action: 'mail.read' },
];

/** A page loaded on first visit, with a loading state while its code arrives on a first page load. */
function lazyPage(load: () => Promise<ComponentType>) {
  return { lazy: () => load().then((Component) => ({ Component })), hydrateFallbackElement: <LoadingState /> };
}

/** Routes only compose features; each feature adds its pages here. */
const router = createBrowserRouter([
  // Before sign-in
  { path: '/sign-in', element: <SignInPage /> },
  { path: '/forgot-password', element: <ForgotPasswordPage /> },
  { path: '/set-password', element: <SetPasswordPage /> },
  // Everything else needs a signed-in user
  {
    element: <ProtectedLayout nav={nav} />,
    children: [
      { index: true, element: <HomeRoute /> },
      { path: 'account/password', element: <ChangePasswordPage /> },
      { path: 'account/tokens', ...lazyPage(() => import('@/features/tokens/components/tokens-page').then((m) => m.TokensPage)) },
      { path: 'api-docs', ...lazyPage(() => import('@/features/api-docs/components/api-docs-page').then((m) => m.ApiDocsPage)) },
      {
        path: 'users',
        element: (
          <RequirePermission action="users.manage">
            <UsersPage />
          </RequirePermission>
        ),
      },
      {
        path: 'audit',
        element: (
          <RequirePermission action="audit.read">
            <AuditPage />
          </RequirePermission>
        ),
      },
      {
        path: 'mail',
        element: (
          <RequirePermission action="mail.read">
            <MailOutboxPage />
          </RequirePermission>
        ),
      },
      // Sites, batteries and profiles: loaded on first visit, so charts and tables stay out of the first bundle.
      { path: 'sites', ...lazyPage(() => import('./routes/sites').then((m) => m.SitesRoute)) },
      { path: 'sites/:id', ...lazyPage(() => import('./routes/site').then((m) => m.SiteRoute)) },
      { path: 'batteries/:id', ...lazyPage(() => import('./routes/battery').then((m) => m.BatteryRoute)) },
      { path: 'profiles', ...lazyPage(() => import('./routes/profiles').then((m) => m.ProfilesRoute)) },
      { path: 'profiles/:id', ...lazyPage(() => import('./routes/profile').then((m) => m.ProfileRoute)) },
      { path: 'sign-off', lazy: () => import('./routes/sign-off').then((m) => ({ Component: m.SignOffRoute })) },
      // Plans and horizon studies: loaded on first visit (charts and tables stay out of the first bundle).
      { path: 'plans', ...lazyPage(() => import('@/features/plans/components/plans-page').then((m) => m.PlansPage)) },
      { path: 'plans/new', ...lazyPage(() => import('@/features/plans/components/new-plan-page').then((m) => m.NewPlanPage)) },
      { path: 'plans/compare', ...lazyPage(() => import('@/features/plans/components/compare-page').then((m) => m.ComparePage)) },
      { path: 'plans/:id', ...lazyPage(() => import('./routes/plan').then((m) => m.PlanRoute)) },
      { path: 'studies', ...lazyPage(() => import('@/features/studies/components/studies-page').then((m) => m.StudiesPage)) },
      {
        path: 'studies/new',
        ...lazyPage(() => import('@/features/studies/components/new-study-page').then((m) => m.NewStudyPage)),
      },
      { path: 'studies/:id', ...lazyPage(() => import('@/features/studies/components/study-page').then((m) => m.StudyPage)) },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
