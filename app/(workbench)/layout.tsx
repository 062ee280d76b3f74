import { requireUser } from "@/lib/auth/dal";
import { AppNav } from "@/components/shell/app-nav";

/** Every signed-in screen: the top bar and a main container. Signed-out visitors go to /sign-in. */
export default async function WorkbenchLayout({ children }: { children: React.ReactNode }) {
  const user = await requireUser();
  return (
    <div className="flex min-h-dvh flex-col">
      <AppNav
        user={{ id: user.id, name: user.name, email: user.email, role: user.role, teamName: user.teamName }}
      />
      <main id="main" className="mx-auto w-full max-w-screen-2xl flex-1 px-4 py-6 sm:px-6 lg:py-8">
        {children}
      </main>
    </div>
  );
}
