import Link from 'next/link';

const TABS = [
  { href: '/admin/users', label: 'Users and invitations' },
  { href: '/admin/outbox', label: 'Mail outbox' },
  { href: '/admin/audit', label: 'Audit log' },
  { href: '/admin/grade-rules', label: 'Grade rules' },
];

export function AdminTabs({ current }: { current: string }) {
  return (
    <nav aria-label="Admin" className="mb-6 flex flex-wrap gap-2 text-sm">
      {TABS.map((t) => (
        <Link
          key={t.href}
          href={t.href}
          aria-current={t.href === current ? 'page' : undefined}
          className={`rounded-md px-3 py-1.5 ${t.href === current ? 'bg-leaf-700 text-white' : 'border border-stone-300 bg-white hover:bg-stone-100'}`}
        >
          {t.label}
        </Link>
      ))}
    </nav>
  );
}
