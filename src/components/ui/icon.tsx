import Svg, { Circle, Path, Rect } from 'react-native-svg';

/** Probepath's line icons, drawn on a 24-unit grid with a 2-unit stroke. */
const drawings = {
  bench: (
    <>
      <Rect x={5} y={2.5} width={14} height={19} rx={2.5} />
      <Rect x={8} y={5.5} width={8} height={5} rx={1} />
      <Circle cx={12} cy={15.5} r={2.8} />
    </>
  ),
  procedures: (
    <>
      <Circle cx={12} cy={5} r={2.5} />
      <Circle cx={6} cy={19} r={2.5} />
      <Rect x={15.5} y={16.5} width={5} height={5} rx={1} />
      <Path d="M12 7.5V11M6 16.5V11h12v5.5" />
    </>
  ),
  replays: (
    <>
      <Circle cx={12} cy={12} r={9} />
      <Path d="M10 8.5l5.5 3.5-5.5 3.5z" />
    </>
  ),
  members: (
    <>
      <Circle cx={9} cy={8} r={3.2} />
      <Path d="M3 20c0-3.3 2.7-6 6-6s6 2.7 6 6" />
      <Circle cx={17} cy={9} r={2.5} />
      <Path d="M16.5 14.2c2.6.4 4.5 2.7 4.5 5.8" />
    </>
  ),
  outbox: (
    <>
      <Rect x={3} y={5} width={18} height={14} rx={2} />
      <Path d="M3.8 6.5L12 12.8l8.2-6.3" />
    </>
  ),
  account: (
    <>
      <Circle cx={12} cy={8} r={4} />
      <Path d="M4 21c0-4.4 3.6-8 8-8s8 3.6 8 8" />
    </>
  ),
  signOut: <Path d="M10 4H5.5A1.5 1.5 0 0 0 4 5.5v13A1.5 1.5 0 0 0 5.5 20H10M15 8l4 4-4 4M19 12H9" />,
  lock: (
    <>
      <Rect x={5} y={11} width={14} height={10} rx={2} />
      <Path d="M8 11V7.5a4 4 0 0 1 8 0V11M12 15v2" />
    </>
  ),
  unplugged: <Path d="M2 12h5M7 8h3v8H7zM22 12h-5M17 8.5v7M17 10h-3M17 14h-3" />,
  alert: <Path d="M12 3.5L21.5 20h-19zM12 10v4.5M12 17.5v.5" />,
  check: <Path d="M5 12.5l4.5 4.5L19 7" />,
  back: <Path d="M15 5l-7 7 7 7" />,
  key: (
    <>
      <Circle cx={8} cy={14} r={4.5} />
      <Path d="M11.2 10.8L20 2M16.5 5.5l2.5 2.5M14 8l2 2" />
    </>
  ),
  plus: <Path d="M12 5v14M5 12h14" />,
  zoomIn: (
    <>
      <Circle cx={10.5} cy={10.5} r={6.5} />
      <Path d="M15.2 15.2L20.5 20.5M7.5 10.5h6M10.5 7.5v6" />
    </>
  ),
  zoomOut: (
    <>
      <Circle cx={10.5} cy={10.5} r={6.5} />
      <Path d="M15.2 15.2L20.5 20.5M7.5 10.5h6" />
    </>
  ),
  fit: <Path d="M4 9V4h5M15 4h5v5M20 15v5h-5M9 20H4v-5" />,
  download: <Path d="M12 3.5v11M7 10l5 5 5-5M4.5 17v3h15v-3" />,
  upload: <Path d="M12 15V4M7 9l5-5 5 5M4.5 17v3h15v-3" />,
  forward: <Path d="M9 5l7 7-7 7" />,
  path: (
    <>
      <Circle cx={5} cy={5} r={2} />
      <Circle cx={5} cy={12} r={2} />
      <Circle cx={5} cy={19} r={2} />
      <Path d="M10 5h10M10 12h10M10 19h10" />
    </>
  ),
  pending: (
    <>
      <Circle cx={12} cy={12} r={9} />
      <Path d="M12 7v5l3.5 2.5" />
    </>
  ),
  note: <Path d="M5 3.5h10l4 4v13H5zM14.5 3.5v4.5h4.5M8.5 12h7M8.5 16h5" />,
  report: <Path d="M6 2.5h9l4 4v15H6zM9.5 11h6M9.5 14.5h6M9.5 18h4" />,
  caution: <Path d="M12 2.5l9.5 9.5-9.5 9.5L2.5 12zM12 8v5M12 16v.5" />,
} as const;

export type IconName = keyof typeof drawings;

export function Icon({ name, size = 24, color }: { name: IconName; size?: number; color: string }) {
  return (
    <Svg
      width={size}
      height={size}
      viewBox="0 0 24 24"
      fill="none"
      stroke={color}
      strokeWidth={2}
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden
    >
      {drawings[name]}
    </Svg>
  );
}
