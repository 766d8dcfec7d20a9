/**
 * The canonical key of a property, which groups correlations on one property page: `property.key` when the
 * metadata gives one, else the name in lower case, accents dropped, every run of other characters one hyphen.
 * @example propertyKey({ name: 'Specific heat capacity' }) // => "specific-heat-capacity"
 * @example propertyKey({ name: 'saturated-liquid density' }) // => "saturated-liquid-density"
 */
export function propertyKey(property: { readonly name: string; readonly key?: string | undefined }): string {
  if (property.key) return property.key;
  const key = property.name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return key === '' ? 'property' : key;
}
