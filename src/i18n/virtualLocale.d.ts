/** The locale parts served by src/i18n/build/localeChunks.ts. */
declare module 'virtual:casefront-locale/*' {
  const messages: import('./localeParts').Messages;
  export default messages;
}
