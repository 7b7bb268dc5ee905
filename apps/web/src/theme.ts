import {
  ActionIcon,
  Badge,
  Button,
  Card,
  createTheme,
  Modal,
  Notification,
  Paper,
  Select,
  TextInput,
  Tooltip,
  type MantineColorsTuple,
} from '@mantine/core';

// Potlife's palette: a warm amber for the catalysed resin and the actions, a cool grey-green
// slate for the cured topcoat and the chrome around the work.
const resin: MantineColorsTuple = [
  '#fff5e8',
  '#ffe8c7',
  '#fdd094',
  '#fab55c',
  '#f69c31',
  '#ec8716',
  '#d4740b',
  '#b15e08',
  '#8c4a0a',
  '#6b390c',
];

const topcoat: MantineColorsTuple = [
  '#f3f5f5',
  '#e4e9e9',
  '#c8d1d1',
  '#a8b5b5',
  '#8a9999',
  '#6d7e7e',
  '#566565',
  '#424f50',
  '#2f3a3b',
  '#1e2728',
];

const fontStack = 'Manrope, ui-sans-serif, system-ui, -apple-system, "Segoe UI", Roboto, sans-serif';

export const brandColors = {
  chrome: topcoat[9],
  chromeText: topcoat[1],
  resinLight: resin[3],
  resin: resin[5],
  resinDeep: resin[7],
  laminate: topcoat[4],
} as const;

export const theme = createTheme({
  fontFamily: fontStack,
  fontFamilyMonospace: 'ui-monospace, SFMono-Regular, Menlo, Consolas, monospace',
  headings: {
    fontFamily: fontStack,
    fontWeight: '700',
    sizes: {
      h1: { fontSize: '1.75rem', lineHeight: '1.25' },
      h2: { fontSize: '1.375rem', lineHeight: '1.3' },
      h3: { fontSize: '1.125rem', lineHeight: '1.35' },
    },
  },
  colors: { resin, topcoat },
  primaryColor: 'resin',
  primaryShade: { light: 7, dark: 5 },
  defaultRadius: 'md',
  cursorType: 'pointer',
  black: topcoat[9],
  components: {
    Button: Button.extend({ defaultProps: { fw: 600 } }),
    ActionIcon: ActionIcon.extend({ defaultProps: { variant: 'subtle' } }),
    Badge: Badge.extend({ defaultProps: { variant: 'light', radius: 'sm' } }),
    Card: Card.extend({ defaultProps: { withBorder: true, radius: 'lg', padding: 'lg' } }),
    Paper: Paper.extend({ defaultProps: { radius: 'lg' } }),
    TextInput: TextInput.extend({ defaultProps: { size: 'md' } }),
    Select: Select.extend({ defaultProps: { allowDeselect: false } }),
    Modal: Modal.extend({ defaultProps: { radius: 'lg', centered: true } }),
    Notification: Notification.extend({ defaultProps: { radius: 'md' } }),
    Tooltip: Tooltip.extend({ defaultProps: { withArrow: true } }),
  },
});
