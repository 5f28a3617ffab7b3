declare module 'convert-units' {
  interface Converter {
    from(unit: string): { to(unit: string): number };
    possibilities(measure?: string): string[];
  }
  function convert(value?: number): Converter;
  export default convert;
}
