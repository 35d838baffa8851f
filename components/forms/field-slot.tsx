import { useCallback, type ReactNode } from 'react';
import { View, type StyleProp, type ViewStyle } from 'react-native';
import type { RefCallBack } from 'react-hook-form';
import { revealField } from './reveal-field';

type Props = { fieldRef: RefCallBack; style?: StyleProp<ViewStyle>; children: ReactNode };

/**
 * Wraps one form field so react-hook-form can bring it into view and focus it when it holds the first refusal
 * (after a save, or when the server names it): text, numbers, pickers and chip groups alike.
 */
export function FieldSlot({ fieldRef, style, children }: Props) {
  const register = useCallback(
    (element: View | null) => fieldRef(element ? { focus: () => revealField(element) } : null),
    [fieldRef],
  );
  return (
    <View ref={register} style={style}>
      {children}
    </View>
  );
}
