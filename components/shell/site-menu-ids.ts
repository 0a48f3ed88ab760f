// The ids the header's menu button and panel share (aria-controls, and the no-JavaScript style
// in site-header.tsx). A plain module: a constant exported from a "use client" file reaches a
// server component as a client reference, not as its value.
export const SITE_MENU_ID = "site-menu";
export const SITE_MENU_BUTTON_ID = "site-menu-button";
