export type CsvFileButtonProps = {
  onLoaded: (file: { name: string; text: string }) => void;
  onError: (message: string) => void;
  disabled?: boolean;
  testID: string;
};
