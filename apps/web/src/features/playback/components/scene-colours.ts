/** Colours of the 3D scenes, taken from the design tokens in src/styles.css (WebGL cannot read CSS variables). */
export const sceneColours = {
  /** Scene background: ink. */
  background: '#10282c',
  paper: '#f5f2ea',
  rule: '#d8d1c0',
  ruleStrong: '#b9ae97',
  inkWash: '#dde3e0',
  inkSoft: '#4a5f61',
  sodium: '#d9661f',
  sodiumWash: '#f8e4d3',
  sage: '#8a9a7b',
  sageWash: '#e4e9dc',
  /** The vehicle in full shadow. */
  dimmed: '#56686a',
} as const;
