// For the root `tsc` run only (which does not read .vue files); vue-tsc type-checks them for real
// with renderer/tsconfig.json, which excludes this shim.
declare module '*.vue' {
  import type { DefineComponent } from 'vue';
  const component: DefineComponent<object, object, unknown>;
  export default component;
}
