import { useEffect, useId, useRef, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { roleLabels, type AuthUser } from '@shared/schemas/auth';
import { NumberFormatChoice } from '@/components/number-format-choice';
import { useSignOut } from '../api/sign-out';

const initials = (name: string) =>
  name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((w) => w[0]?.toUpperCase())
    .join('');

/** The signed-in user's name and role, opening to "Change password", "API tokens", "API reference" and "Sign out". Escape closes it. */
export function AccountMenu({ user }: { user: AuthUser }) {
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const button = useRef<HTMLButtonElement>(null);
  const root = useRef<HTMLDivElement>(null);
  const signOut = useSignOut();
  const navigate = useNavigate();

  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape') {
        setOpen(false);
        button.current?.focus();
      }
    };
    const onPointer = (e: PointerEvent) => {
      if (!root.current?.contains(e.target as Node)) setOpen(false);
    };
    document.addEventListener('keydown', onKey);
    document.addEventListener('pointerdown', onPointer);
    return () => {
      document.removeEventListener('keydown', onKey);
      document.removeEventListener('pointerdown', onPointer);
    };
  }, [open]);

  const doSignOut = () => signOut.mutate(undefined, { onSettled: () => void navigate('/sign-in', { replace: true }) });

  return (
    <div ref={root} className="relative">
      <button
        ref={button}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((o) => !o)}
        className="flex items-center gap-2 rounded-full py-1 pr-3 pl-1 text-sm text-ink-50 hover:bg-ink-800"
      >
        <span
          aria-hidden="true"
          className="grid h-8 w-8 place-items-center rounded-full bg-seaglass-700 text-xs font-bold text-white"
        >
          {initials(user.name)}
        </span>
        <span className="hidden text-left leading-tight sm:block">
          <span className="block font-medium">{user.name}</span>
          <span className="block text-xs text-ink-300">{roleLabels[user.role]}</span>
        </span>
        <span className="sr-only">Account menu</span>
      </button>
      {open && (
        <div
          id={panelId}
          className="absolute right-0 z-20 mt-2 w-72 rounded-lg border border-ink-100 bg-white py-2 text-ink-900 shadow-lg"
        >
          <p className="border-b border-ink-100 px-4 pb-2 text-sm">
            Signed in as <span className="font-medium break-all">{user.email}</span>
            <span className="mt-0.5 block text-xs text-ink-500">Role: {roleLabels[user.role]}</span>
          </p>
          <div className="border-b border-ink-100 px-4 py-2">
            <NumberFormatChoice id={`${panelId}-number-format`} />
          </div>
          <ul className="pt-1 text-sm">
            <li>
              <Link
                to="/account/password"
                onClick={() => setOpen(false)}
                className="block px-4 py-2 hover:bg-ink-50 focus-visible:bg-ink-50"
              >
                Change password
              </Link>
            </li>
            <li>
              <Link
                to="/account/tokens"
                onClick={() => setOpen(false)}
                className="block px-4 py-2 hover:bg-ink-50 focus-visible:bg-ink-50"
              >
                API tokens
              </Link>
            </li>
            <li>
              <Link
                to="/api-docs"
                onClick={() => setOpen(false)}
                className="block px-4 py-2 hover:bg-ink-50 focus-visible:bg-ink-50"
              >
                API reference
              </Link>
            </li>
            <li>
              <button
                type="button"
                onClick={doSignOut}
                disabled={signOut.isPending}
                className="block w-full px-4 py-2 text-left hover:bg-ink-50"
              >
                {signOut.isPending ? 'Signing out…' : 'Sign out'}
              </button>
            </li>
          </ul>
        </div>
      )}
    </div>
  );
}
