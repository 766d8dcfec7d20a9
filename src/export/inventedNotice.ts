/** Notice carried by every page and export of invented demonstration data. */
export const INVENTED_NOTICE =
  'Invented data: this correlation is fitted to made-up demonstration numbers. It describes no real substance and must not be used for any engineering purpose.';
