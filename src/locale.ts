/**
 * naive-ui's British English with our own defaults: no stock placeholders ("Please Input", "Please
 * Select", "Select Date": a field says what it wants or shows nothing), dates typed and shown as on
 * every page ("12 Mar 2026", shared/format.ts), and an empty table in plain words.
 */
import { enGB, type NLocale } from 'naive-ui';

export const appLocale: NLocale = {
  ...enGB,
  name: 'en-GB-bundlesmith',
  Cascader: { ...enGB.Cascader, placeholder: '' },
  Select: { ...enGB.Select, placeholder: '' },
  TimePicker: { ...enGB.TimePicker, placeholder: '' },
  Input: { ...enGB.Input, placeholder: '' },
  InputNumber: { ...enGB.InputNumber, placeholder: '' },
  DatePicker: {
    ...enGB.DatePicker,
    dateFormat: 'd MMM yyyy',
    dateTimeFormat: 'd MMM yyyy, HH:mm',
    datePlaceholder: 'e.g. 12 Mar 2027',
    datetimePlaceholder: 'e.g. 12 Mar 2027, 14:00',
    monthPlaceholder: '',
    yearPlaceholder: '',
    quarterPlaceholder: '',
    weekPlaceholder: '',
    startDatePlaceholder: 'From',
    endDatePlaceholder: 'To',
    startDatetimePlaceholder: 'From',
    endDatetimePlaceholder: 'To',
    startMonthPlaceholder: 'From',
    endMonthPlaceholder: 'To',
  },
  Empty: { ...enGB.Empty, description: 'Nothing to show' },
};
