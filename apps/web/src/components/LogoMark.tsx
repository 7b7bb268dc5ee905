import { brandColors } from '../theme';

interface LogoMarkProps {
  size?: number;
  /** The background the mark sits on, so the laminate lines keep their contrast. */
  tone?: 'dark' | 'light';
  title?: string;
}

// Potlife's mark: a resin pot with a drip running over its rim, sitting on two laminate layers.
export function LogoMark({ size = 32, tone = 'light', title }: LogoMarkProps) {
  const laminate = tone === 'dark' ? brandColors.laminate : '#6d7e7e';
  return (
    <svg
      width={size}
      height={size}
      viewBox="0 0 40 40"
      role={title ? 'img' : undefined}
      aria-hidden={title ? undefined : true}
      aria-label={title}
      focusable="false"
    >
      <path
        d="M12.5 9.5c1.6-4.2 4.2-6 7.5-6s5.9 1.8 7.5 6"
        fill="none"
        stroke={laminate}
        strokeWidth="2"
        strokeLinecap="round"
      />
      <path
        d="M9.2 12.6h21.6l-1.7 15.6a2.2 2.2 0 0 1-2.2 2h-13.8a2.2 2.2 0 0 1-2.2-2z"
        fill={brandColors.resin}
      />
      <rect x="7.4" y="9.4" width="25.2" height="4.4" rx="2.2" fill={brandColors.resinDeep} />
      <path d="M13.6 13.6v6.9a1.75 1.75 0 0 0 3.5 0v-6.9z" fill={brandColors.resinDeep} />
      <path d="M22.4 13.6v3.4a1.35 1.35 0 0 0 2.7 0v-3.4z" fill={brandColors.resinDeep} />
      <path d="M5 33.6h30" stroke={brandColors.resinLight} strokeWidth="2.2" strokeLinecap="round" />
      <path d="M7 37.2h26" stroke={laminate} strokeWidth="2.2" strokeLinecap="round" />
    </svg>
  );
}
