import { create } from 'zustand';

export type Toast = {
  id: number;
  message: string;
  tone: 'success' | 'info' | 'danger';
  action?: { label: string; run: () => void };
};

type ToastState = { toasts: Toast[] };

export const useToastStore = create<ToastState>(() => ({ toasts: [] }));

let nextId = 1;
// Long enough to read a sentence and reach an "Undo" button.
const TOAST_MS = 6500;

export function showToast(message: string, options: Omit<Partial<Toast>, 'id' | 'message'> = {}): number {
  const id = nextId++;
  useToastStore.setState((s) => ({
    toasts: [...s.toasts.slice(-1), { id, message, tone: options.tone ?? 'success', action: options.action }],
  }));
  setTimeout(() => dismissToast(id), TOAST_MS);
  return id;
}

export function dismissToast(id: number): void {
  useToastStore.setState((s) => ({ toasts: s.toasts.filter((t) => t.id !== id) }));
}
