export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return <div className="mx-auto max-w-md rounded-xl border border-rule bg-surface-raised p-6 shadow-sm md:p-8">{children}</div>;
}
