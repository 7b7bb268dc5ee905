import { Decimal } from '@potlife/domain';
import type { MaterialChoice } from '../api/get-choices';
import type { ReceiptBody } from '../api/types';

// The receive form's values, checks and body. The API checks everything again (lot tracking,
// segregation, cabinet capacity, over-delivery) and answers with the reason when it refuses.

export type ReceiptLineValues = {
  key: string;
  materialId: string;
  batchNumber: string;
  expiresOn: string;
  packSize: string;
  packsReceived: string;
  packsRefused: string;
  refusedReason: string;
  unitCost: string;
  locationId: string;
};

export type ReceiptValues = {
  supplierMode: 'listed' | 'other';
  supplierId: string;
  supplierName: string;
  deliveryNoteNumber: string;
  receivedOn: string;
  note: string;
  lines: ReceiptLineValues[];
};

let lineKey = 0;
export function newLine(locationId = ''): ReceiptLineValues {
  lineKey += 1;
  return {
    key: `line-${lineKey}`,
    materialId: '',
    batchNumber: '',
    expiresOn: '',
    packSize: '',
    packsReceived: '',
    packsRefused: '0',
    refusedReason: '',
    unitCost: '',
    locationId,
  };
}

export function todayIso(): string {
  const now = new Date();
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

export function initialReceipt(): ReceiptValues {
  return {
    supplierMode: 'listed',
    supplierId: '',
    supplierName: '',
    deliveryNoteNumber: '',
    receivedOn: todayIso(),
    note: '',
    lines: [newLine()],
  };
}

const isDate = (value: string) =>
  /^\d{4}-\d{2}-\d{2}$/.test(value) && !Number.isNaN(Date.parse(`${value}T00:00:00Z`));
const wholePacks = (value: string) => /^\d{1,6}$/.test(value.trim());

type Errors = Record<string, string>;

export function validateReceipt(values: ReceiptValues, materials: readonly MaterialChoice[]): Errors {
  const errors: Errors = {};
  if (values.supplierMode === 'listed' && values.supplierId === '') {
    errors.supplierId = 'Choose who delivered, or pick "Not in the list"';
  }
  if (values.supplierMode === 'other' && values.supplierName.trim() === '') {
    errors.supplierName = 'Enter who delivered';
  }
  if (values.supplierName.length > 160) {
    errors.supplierName = 'Keep it to 160 characters';
  }
  if (values.deliveryNoteNumber.trim().length > 60) {
    errors.deliveryNoteNumber = 'Keep it to 60 characters';
  }
  if (!isDate(values.receivedOn)) {
    errors.receivedOn = 'Choose the day it came';
  } else if (values.receivedOn > todayIso()) {
    errors.receivedOn = 'A delivery cannot be received in the future';
  }
  if (values.lines.length === 0) {
    errors.lines = 'Add at least one line';
  }
  values.lines.forEach((line, index) => {
    const at = (field: string) => `lines.${index}.${field}`;
    const material = materials.find((m) => m.id === line.materialId);
    if (!material) {
      errors[at('materialId')] = 'Choose the material';
    }
    if (material && material.lotTracked && line.batchNumber.trim() === '') {
      errors[at('batchNumber')] = "Enter the maker's batch number from the pack";
    }
    if (line.batchNumber.trim().length > 60) {
      errors[at('batchNumber')] = 'Keep it to 60 characters';
    }
    if (line.expiresOn !== '' && !isDate(line.expiresOn)) {
      errors[at('expiresOn')] = 'Choose a date, or leave it empty';
    }
    if (line.packSize === '') {
      errors[at('packSize')] = 'Choose the pack';
    }
    const received = line.packsReceived.trim();
    const refused = line.packsRefused.trim() === '' ? '0' : line.packsRefused.trim();
    if (!wholePacks(received)) {
      errors[at('packsReceived')] = 'Enter the whole packs taken in (0 if all were refused)';
    }
    if (!wholePacks(refused)) {
      errors[at('packsRefused')] = 'Enter whole packs, 0 if none';
    }
    if (wholePacks(received) && wholePacks(refused) && Number(received) === 0 && Number(refused) === 0) {
      errors[at('packsReceived')] = 'A line takes in or refuses at least one pack';
    }
    if (wholePacks(refused) && Number(refused) > 0 && line.refusedReason.trim() === '') {
      errors[at('refusedReason')] = 'Say what was wrong with the refused packs';
    }
    if (line.unitCost.trim() !== '' && !/^\d{1,10}(\.\d{1,4})?$/.test(line.unitCost.trim())) {
      errors[at('unitCost')] = 'Write pounds, like 3.20, or leave it empty for the price on file';
    }
    if (wholePacks(received) && Number(received) > 0 && line.locationId === '') {
      errors[at('locationId')] = 'Choose where the packs are put away';
    }
  });
  return errors;
}

const text = (value: string) => (value.trim() === '' ? undefined : value.trim());

export function receiptBodyOf(values: ReceiptValues): ReceiptBody {
  return {
    ...(values.supplierMode === 'listed'
      ? { supplierId: values.supplierId }
      : { supplierName: values.supplierName.trim() }),
    ...(text(values.deliveryNoteNumber) ? { deliveryNoteNumber: text(values.deliveryNoteNumber) } : {}),
    receivedOn: values.receivedOn,
    ...(text(values.note) ? { note: text(values.note) } : {}),
    lines: values.lines.map((line) => {
      const received = Number(line.packsReceived.trim());
      const refused = line.packsRefused.trim() === '' ? 0 : Number(line.packsRefused.trim());
      return {
        materialId: line.materialId,
        ...(text(line.batchNumber) ? { batchNumber: text(line.batchNumber) } : {}),
        ...(line.expiresOn ? { expiresOn: line.expiresOn } : {}),
        packsReceived: received,
        packSize: line.packSize,
        ...(refused > 0 ? { packsRefused: refused, refusedReason: text(line.refusedReason) } : {}),
        ...(text(line.unitCost) ? { unitCost: text(line.unitCost) } : {}),
        ...(received > 0 ? { locationId: line.locationId } : {}),
      };
    }),
  };
}

/** Packs × pack size, for the line's preview (the API records the quantity). */
export function lineQuantity(line: ReceiptLineValues): string | null {
  if (!wholePacks(line.packsReceived) || line.packSize === '') {
    return null;
  }
  return new Decimal(line.packSize).mul(Number(line.packsReceived.trim())).toString();
}
