import type { GlobalThemeOverrides } from 'naive-ui';

/**
 * Bundlesmith's palette: the deep blue-green of a painted shell, steel greys, and a copper accent
 * for the tube bundle. Colours are used through these names so the look can change in one place.
 */
export const palette = {
  shell: '#0f2e36',
  shellRaised: '#173f49',
  teal: '#1d6470',
  tealHover: '#257a87',
  tealPressed: '#164f59',
  tealSoft: '#e3eff1',
  copper: '#c47a45',
  copperHover: '#d38c58',
  copperPressed: '#a9632f',
  steel: '#5b6b73',
  line: '#d5dde0',
  page: '#f3f6f7',
  ink: '#17262c',
  danger: '#b3403a',
  warning: '#b7821f',
  success: '#2f7d4f',
} as const;

const font = "'Source Sans 3', 'Segoe UI', system-ui, -apple-system, sans-serif";

export const themeOverrides: GlobalThemeOverrides = {
  common: {
    fontFamily: font,
    fontSize: '15px',
    fontSizeMedium: '15px',
    fontWeightStrong: '600',
    primaryColor: palette.teal,
    primaryColorHover: palette.tealHover,
    primaryColorPressed: palette.tealPressed,
    primaryColorSuppl: palette.tealHover,
    infoColor: palette.teal,
    infoColorHover: palette.tealHover,
    infoColorPressed: palette.tealPressed,
    warningColor: palette.warning,
    errorColor: palette.danger,
    successColor: palette.success,
    textColorBase: palette.ink,
    textColor1: palette.ink,
    textColor2: '#2c3c43',
    textColor3: palette.steel,
    bodyColor: palette.page,
    borderColor: palette.line,
    dividerColor: palette.line,
    borderRadius: '6px',
    borderRadiusSmall: '4px',
  },
  Card: { borderRadius: '10px', titleFontSizeMedium: '18px', titleFontWeight: '600' },
  Button: { fontWeight: '600' },
  Tag: { borderRadius: '999px' },
  DataTable: { thColor: palette.tealSoft, thTextColor: palette.ink, thFontWeight: '600' },
};
