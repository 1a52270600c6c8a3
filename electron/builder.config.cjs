/**
 * electron-builder configuration for `npm run dist` (needs the Electron binary and, for the mac and
 * Windows targets, their host OS or signing setup; not runnable on the CI machine).
 *
 * Everything the app needs at run time is already bundled: dist/electron/main.cjs and preload.cjs
 * (esbuild, electron/build-main.mjs) and dist/renderer/ (vite). So node_modules is left out of the
 * archive entirely; the bundles require nothing but `electron` and Node built-ins.
 *
 * @type {import("electron-builder").Configuration}
 */
module.exports = {
  appId: "org.brinefield.app",
  productName: "Brinefield",
  copyright: "Copyright © Brinefield contributors",
  directories: {
    output: "release",
    buildResources: "electron/build-resources",
  },
  files: [
    "package.json",
    "dist/electron/main.cjs",
    "dist/electron/preload.cjs",
    "dist/renderer/**/*",
    "!**/*.map",
    "!node_modules/**/*",
  ],
  extraMetadata: {
    main: "dist/electron/main.cjs",
  },
  asar: true,
  // Hardening switches baked into the Electron binary (Electron "fuses").
  electronFuses: {
    runAsNode: false,
    enableCookieEncryption: true,
    enableNodeOptionsEnvironmentVariable: false,
    enableNodeCliInspectArguments: false,
    enableEmbeddedAsarIntegrityValidation: true,
    onlyLoadAppFromAsar: true,
    // The renderer is served from the app's own brinefield:// scheme (electron/app-protocol.ts), so
    // file:// pages get no extra privileges.
    grantFileProtocolExtraPrivileges: false,
  },
  linux: {
    target: ["AppImage", "deb"],
    category: "Science",
    synopsis: "Screening of seabed diffusers for desalination brine outfalls",
    maintainer: "Brinefield contributors <maintainers@brinefield.invalid>",
  },
  deb: {
    packageCategory: "science",
  },
  win: {
    target: ["nsis"],
  },
  nsis: {
    oneClick: false,
    perMachine: false,
    allowToChangeInstallationDirectory: true,
  },
  mac: {
    target: ["dmg"],
    category: "public.app-category.education",
    hardenedRuntime: true,
  },
};
