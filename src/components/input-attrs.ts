import type { InputHTMLAttributes } from 'vue';

/**
 * Attributes for the native <input> inside a naive-ui NInput, with a `data-test` name for the browser
 * tests (Vue's attribute types do not list data-* keys, hence the cast).
 */
export function inputAttrs(test: string, attrs: InputHTMLAttributes = {}): InputHTMLAttributes {
  return { ...attrs, 'data-test': test } as InputHTMLAttributes;
}
