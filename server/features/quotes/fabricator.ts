/** The demo fabricator's letterhead and standard terms (invented), as printed on offers. */
export const FABRICATOR = {
  name: 'Alder Creek Thermal Works',
  address: ['1400 Millrace Road', 'Alder Creek, OR 97000', 'United States'],
  email: 'quotes@aldercreek.example',
  phone: '+1 555 0142 300',
};

export const OFFER_TERMS = [
  'Payment: the deposit stated above on acceptance of this offer; the balance before shipment. Prices exclude taxes and freight.',
  'Delivery: ex works, lead time counted from receipt of the deposit and approved drawings.',
  'Design: the design is fixed by the duty stated in this offer. A change of duty, fluids or limits requires a revised offer.',
  'Validity: this offer may be accepted until the validity date; afterwards ask for a revised offer.',
];
