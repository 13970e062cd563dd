/** A drawn stand-in where a commodity has no photo yet: a simple fruit outline of our own. */
export function PhotoPlaceholder({ label }: { label: string }) {
  return (
    <svg
      viewBox="0 0 120 80"
      role="img"
      aria-label={`No photo of ${label} yet`}
      className="h-full w-full bg-leaf-50 text-leaf-600"
    >
      <path
        d="M60 24c-9-8-26-6-30 9-5 18 9 35 21 35 5 0 6-2 9-2s4 2 9 2c12 0 26-17 21-35-4-15-21-17-30-9z"
        fill="none"
        stroke="currentColor"
        strokeWidth="2.5"
        strokeLinejoin="round"
      />
      <path d="M60 24c0-7 2-12 6-15" fill="none" stroke="currentColor" strokeWidth="2.5" />
      <path d="M62 18c6-6 14-6 18-3-5 5-12 6-18 3z" fill="currentColor" opacity="0.5" />
      <text x="60" y="76" textAnchor="middle" fontSize="6" fill="currentColor">
        no photo yet
      </text>
    </svg>
  );
}
