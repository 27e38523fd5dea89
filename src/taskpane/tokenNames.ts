/** The names of the Fluent design tokens the pane's stylesheet uses (pane.css: `var(--<name>)`). */
export const USED_TOKENS = [
  'colorNeutralBackground1',
  'colorNeutralBackground2',
  'colorNeutralBackground3',
  'colorNeutralForeground1',
  'colorNeutralForeground2',
  'colorNeutralForeground3',
  'colorNeutralStroke1',
  'colorNeutralStroke2',
  'colorNeutralStrokeAccessible',
  'colorBrandBackground',
  'colorBrandBackgroundHover',
  'colorBrandBackgroundPressed',
  'colorBrandForeground1',
  'colorBrandStroke1',
  'colorNeutralForegroundOnBrand',
  'colorNeutralForegroundDisabled',
  'colorNeutralBackgroundDisabled',
  'colorSubtleBackgroundHover',
  'colorStrokeFocus2',
  'colorBackgroundOverlay',
  'colorStatusDangerForeground1',
  'colorStatusDangerBackground1',
  'colorStatusDangerBorder1',
  'colorStatusSuccessForeground1',
  'colorStatusWarningBackground1',
  'colorStatusWarningBorder1',
  'borderRadiusMedium',
  'fontFamilyBase',
  'fontSizeBase200',
  'fontSizeBase300',
  'fontSizeBase400',
  'fontWeightSemibold',
  'lineHeightBase200',
  'lineHeightBase300',
  'shadow16',
] as const;

/** One of them. */
export type TokenName = (typeof USED_TOKENS)[number];


