// Tailwind CSS v4 runs as a PostCSS plugin; the theme lives in app/globals.css.
const config = { plugins: { "@tailwindcss/postcss": {} } };
export default config;
