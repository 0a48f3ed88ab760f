// Tailwind CSS v4 runs as a PostCSS plugin; the theme lives in app/globals.css.
export default { plugins: { "@tailwindcss/postcss": {} } };
