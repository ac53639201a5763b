import Svg, { Line, Path, Rect, Text as SvgText } from 'react-native-svg';
import { fonts, useTheme } from '@/lib/theme';

/** A drawing of a reading inside its spec window, the picture at the heart of every check. */
export function SpecBarSketch() {
  const c = useTheme();
  return (
    <Svg width="100%" height={96} viewBox="0 0 400 96" aria-hidden>
      <Line x1={8} y1={54} x2={392} y2={54} stroke={c.onChromeMuted} strokeWidth={2} />
      <Rect x={100} y={40} width={22} height={28} fill={c.signal} opacity={0.45} />
      <Rect x={122} y={40} width={156} height={28} fill={c.primary} opacity={0.85} />
      <Rect x={278} y={40} width={22} height={28} fill={c.signal} opacity={0.45} />
      <Path d="M214 22l10 14 10-14z" fill={c.onChrome} />
      <Line x1={224} y1={36} x2={224} y2={72} stroke={c.onChrome} strokeWidth={3} />
      <SvgText x={224} y={16} fill={c.onChrome} fontSize={16} fontFamily={fonts.monoBold} textAnchor="middle">
        0.48 kΩ
      </SvgText>
      <SvgText x={122} y={90} fill={c.onChromeMuted} fontSize={13} fontFamily={fonts.mono} textAnchor="middle">
        0.40
      </SvgText>
      <SvgText x={278} y={90} fill={c.onChromeMuted} fontSize={13} fontFamily={fonts.mono} textAnchor="middle">
        0.60
      </SvgText>
    </Svg>
  );
}
