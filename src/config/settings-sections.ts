/** Anchors of the settings page's sections, for links such as paths.settings.getHref(SETTINGS_SECTIONS.twoStep). */
export const SETTINGS_SECTIONS = {
  twoStep: 'two-step',
} as const;
