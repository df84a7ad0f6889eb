import { Navigate, useNavigate, useSearchParams } from 'react-router';
import { SlotwiseMark } from '@/components/ui/SlotwiseMark';
import { PageSkeleton } from '@/components/ui';
import { useCurrentUser } from '@/lib/session/currentUser';
import type { User } from '@/domain/contracts';
import { homePathFor, safeNextPath } from '@/lib/session/roles';
import { SignInForm } from './SignInForm';
import { FrameSketch } from './FrameSketch';

export default function SignInPage() {
  const navigate = useNavigate();
  const [searchParams] = useSearchParams();
  const next = safeNextPath(searchParams.get('next'));
  const { data: user, isPending } = useCurrentUser();

  if (isPending) return <PageSkeleton label="Checking who is signed in" />;
  if (user) return <Navigate to={next ?? homePathFor(user.role)} replace />;

  const goOn = (signedIn: User) => navigate(next ?? homePathFor(signedIn.role), { replace: true });

  return (
    <div className="grid min-h-dvh lg:grid-cols-[minmax(0,5fr)_minmax(0,4fr)]">
      <aside className="relative hidden flex-col justify-between overflow-hidden bg-ink p-12 text-paper lg:flex">
        <div className="flex items-center gap-3">
          <SlotwiseMark className="size-10" />
          <span className="text-xl font-semibold tracking-tight">Slotwise</span>
        </div>
        <FrameSketch className="mx-auto w-full max-w-md text-metal" />
        <p className="max-w-md text-lg leading-8 text-paper/85">
          Lay out T-slot frames, check every joint and panel, and hand the cut list to the saw — before a single bar is cut.
        </p>
      </aside>
      <main id="main" className="flex items-center justify-center px-6 py-12">
        <div className="flex w-full max-w-sm flex-col gap-8">
          <div className="flex items-center gap-3 lg:hidden">
            <SlotwiseMark className="size-9" />
            <span className="text-xl font-semibold tracking-tight">Slotwise</span>
          </div>
          <div className="flex flex-col gap-2">
            <h1 className="text-3xl font-semibold tracking-tight text-ink">Sign in</h1>
            <p className="text-sm text-ink-soft">Use the account your shop gave you.</p>
          </div>
          <SignInForm onSignedIn={goOn} />
        </div>
      </main>
    </div>
  );
}
