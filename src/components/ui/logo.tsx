/** The Seamrun mark: a running stitch drawn as an S, on thread teal. */
export function Logo({ size = 32 }: { size?: number }) {
  return (
    <span className="inline-flex items-center gap-2">
      <svg width={size} height={size} viewBox="0 0 32 32" aria-hidden>
        <rect width="32" height="32" rx="8" fill="#0F4C5C" />
        <path
          d="M9 21c0 3 3 4 7 4s7-1.5 7-4.5S20 16 16 16s-7-1.5-7-4.5S12 7 16 7s7 1 7 4"
          fill="none"
          stroke="#F4EFE6"
          strokeWidth="2.4"
          strokeLinecap="round"
          strokeDasharray="3 2.6"
        />
      </svg>
      {/* eslint-disable-next-line i18next/no-literal-string -- the product's name is the same in every language */}
      <span className="text-lg font-bold tracking-tight text-thread-800">Seamrun</span>
    </span>
  );
}
