import type { SVGProps } from 'react';

/** Small line icons of our own; emoji are avoided because not every phone or browser draws them. */
function Icon({ children, ...rest }: SVGProps<SVGSVGElement>) {
  return (
    <svg
      width="20"
      height="20"
      viewBox="0 0 20 20"
      fill="none"
      stroke="currentColor"
      strokeWidth="1.8"
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden
      {...rest}
    >
      {children}
    </svg>
  );
}

export const TestTubeIcon = () => (
  <Icon>
    <path d="M7 2.5h6M8 2.5v11a2 2 0 0 0 4 0v-11" />
    <path d="M8 9h4" />
  </Icon>
);
export const DropIcon = () => (
  <Icon>
    <path d="M10 2.5c3 3.6 5 6.4 5 9a5 5 0 0 1-10 0c0-2.6 2-5.4 5-9z" />
  </Icon>
);
export const BottleIcon = () => (
  <Icon>
    <path d="M8 2.5h4M8.5 2.5v3L6 8v8.5a1 1 0 0 0 1 1h6a1 1 0 0 0 1-1V8l-2.5-2.5v-3" />
    <path d="M6 11h8" />
  </Icon>
);
export const FoodIcon = () => (
  <Icon>
    <circle cx="6" cy="12" r="1.6" />
    <circle cx="11" cy="9" r="1.6" />
    <circle cx="14" cy="14" r="1.6" />
    <path d="M4 4l3 3M9 3v3" />
  </Icon>
);
export const WrenchIcon = () => (
  <Icon>
    <path d="M12.5 3a4 4 0 0 0-3.8 5.2L3 13.9 6.1 17l5.7-5.7A4 4 0 0 0 17 7.5l-2.4 2.4-2.5-2.5L14.5 5A4 4 0 0 0 12.5 3z" />
  </Icon>
);
export const FishIcon = () => (
  <Icon>
    <path d="M2.5 10c2.5-3.5 5.5-5 8.5-5 3 0 5 2.2 6.5 5-1.5 2.8-3.5 5-6.5 5-3 0-6-1.5-8.5-5z" />
    <path d="M2.5 10L1 7.5M2.5 10L1 12.5" />
    <circle cx="13.5" cy="9" r="0.8" fill="currentColor" />
  </Icon>
);
export const EyeIcon = () => (
  <Icon>
    <path d="M1.5 10S4.5 4.5 10 4.5 18.5 10 18.5 10 15.5 15.5 10 15.5 1.5 10 1.5 10z" />
    <circle cx="10" cy="10" r="2.5" />
  </Icon>
);
export const CameraIcon = () => (
  <Icon>
    <path d="M2.5 6.5h3l1.5-2h6l1.5 2h3v9h-15z" />
    <circle cx="10" cy="11" r="3" />
  </Icon>
);
export const DownloadIcon = () => (
  <Icon>
    <path d="M10 3v10M6 9.5l4 4 4-4M3.5 17h13" />
  </Icon>
);
export const UploadIcon = () => (
  <Icon>
    <path d="M10 14V4M6 7.5l4-4 4 4M3.5 17h13" />
  </Icon>
);
