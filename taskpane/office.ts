/**
 * The only place the pane touches office.js. Everything here tolerates office.js being absent,
 * loaded outside Office (host null) or running in an Office that lacks a feature.
 */

/** The host name office.js reports ("Excel"), or null outside Office or without office.js. */
export async function officeHost(): Promise<string | null> {
  if (typeof Office === "undefined" || typeof Office.onReady !== "function") return null;
  try {
    const info = await Office.onReady();
    return info.host ? String(info.host) : null;
  } catch {
    return null;
  }
}

/**
 * "dark" or "light" from the Office theme's body background, when Office provides a theme (not
 * every host and platform does); null otherwise, so the browser's colour scheme applies.
 */
export function officeColorScheme(): "dark" | "light" | null {
  if (typeof Office === "undefined") return null;
  const background = Office.context?.officeTheme?.bodyBackgroundColor;
  const match = typeof background === "string" ? /^#?([0-9a-f]{6})$/i.exec(background.trim()) : null;
  if (!match) return null;
  const rgb = parseInt(match[1]!, 16);
  const luminance = 0.2126 * ((rgb >> 16) & 255) + 0.7152 * ((rgb >> 8) & 255) + 0.0722 * (rgb & 255);
  return luminance < 128 ? "dark" : "light";
}
