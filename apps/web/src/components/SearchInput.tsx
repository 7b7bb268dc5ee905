import { CloseButton, TextInput } from '@mantine/core';
import { IconSearch } from '@tabler/icons-react';

/** The filter box above a table. */
export function SearchInput({
  label,
  placeholder,
  value,
  onChange,
  width = 300,
}: {
  label: string;
  placeholder: string;
  value: string;
  onChange: (value: string) => void;
  width?: number;
}) {
  return (
    <TextInput
      aria-label={label}
      placeholder={placeholder}
      leftSection={<IconSearch size={16} />}
      value={value}
      onChange={(event) => onChange(event.currentTarget.value)}
      rightSection={value ? <CloseButton aria-label="Clear the filter" onClick={() => onChange('')} /> : null}
      w={{ base: '100%', sm: width }}
      size="sm"
    />
  );
}
