// Stylesheets are bundled by Vite; they export nothing.
declare module '*.css';
