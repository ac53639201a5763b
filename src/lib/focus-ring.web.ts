/**
 * A keyboard focus ring for buttons and links, shown only when the browser
 * decides focus should be visible (Tab, not a tap). Two tones, white inside
 * and ink outside, so it stands out on the paper background, the ink sidebar
 * and the dark theme alike.
 */
const style = document.createElement('style');
style.textContent = `
[role="button"]:focus-visible, a:focus-visible {
  outline: 3px solid #14202B;
  outline-offset: 3px;
  box-shadow: 0 0 0 3px #FFFFFF;
}
`;
document.head.appendChild(style);

export {};
