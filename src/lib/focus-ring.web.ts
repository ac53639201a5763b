/**
 * A keyboard focus ring for buttons and links, shown only when the browser
 * decides focus should be visible (Tab, not a tap). Two tones, ink outside and
 * white inside, so it stands out on the paper background, the ink sidebar and
 * the dark theme alike; drawn inside the element so screen edges never clip it.
 */
const style = document.createElement('style');
style.textContent = `
[role="button"]:focus-visible, a:focus-visible {
  outline: 3px solid #14202B;
  outline-offset: -3px;
  box-shadow: inset 0 0 0 6px #FFFFFF;
}
`;
document.head.appendChild(style);

export {};
