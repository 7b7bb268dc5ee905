import { Group, Text } from '@mantine/core';
import { LogoMark } from './LogoMark';

interface BrandProps {
  tone?: 'dark' | 'light';
  size?: 'sm' | 'lg';
}

/** The mark and the product name, as the header and the sign-in pages show them. */
export function Brand({ tone = 'light', size = 'sm' }: BrandProps) {
  const large = size === 'lg';
  return (
    <Group gap={large ? 10 : 8} wrap="nowrap">
      <LogoMark size={large ? 40 : 30} tone={tone} />
      <Text
        component="span"
        fw={800}
        fz={large ? 26 : 20}
        lts={-0.4}
        c={tone === 'dark' ? 'white' : 'topcoat.9'}
      >
        Potlife
      </Text>
    </Group>
  );
}
