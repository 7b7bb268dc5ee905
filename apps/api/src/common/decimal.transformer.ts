import { ValueTransformer } from 'typeorm';

/** numeric columns stay decimal strings end to end: never a JS number for money or quantities. */
export const decimalString: ValueTransformer = {
  to: (value: string | null | undefined) => value,
  from: (value: string | null) => value,
};
