/** `import text from './file.css?raw'`: the stylesheet as a string (webpack asset/source, Vite ?raw). */
declare module '*.css?raw' {
  const text: string;
  export default text;
}
