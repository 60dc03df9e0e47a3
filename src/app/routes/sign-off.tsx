import { RequirePermission } from '@/features/auth/components/require-permission';
import { SignOffPage } from '@/features/sign-off/components/sign-off-page';

/** `/sign-off`: plans awaiting the signed-in approver's sign-off. */
export function SignOffRoute() {
  return (
    <RequirePermission action="plans.approve">
      <SignOffPage />
    </RequirePermission>
  );
}
