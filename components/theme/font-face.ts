/** Native apps name the loaded font itself (the web build uses font-face.web.ts). */
export const face = (family: string): string => family;
