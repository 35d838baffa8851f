/**
 * `data-*` attributes on the web (react-native-web's `dataSet`, which React Native's types do not declare);
 * native platforms ignore them. The browser tests read them, e.g. to find every card or the chart's drawn range.
 */
export function webData(values: Record<string, string>): object {
  return { dataSet: values };
}
