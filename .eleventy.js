// Eleventy wiring for Sublevel Atlas. It only connects parts: the data is
// loaded and computed in src/site/loadAtlas.ts, numbers are formatted in
// src/site/, and pages are laid out in templates/. See DEVELOPERS.md.

export default async function (eleventyConfig) {
  const { loadAtlas, buildDateFrom } = await import("./src/site/loadAtlas.ts");
  const { atlasPlugin } = await import("./src/site/eleventyPlugin.ts");

  // --- Data: one computation per build, from ATLAS_DATA (default data/) ---
  const atlas = loadAtlas({
    dataDir: process.env.ATLAS_DATA || "data",
    buildDate: buildDateFrom(process.env),
  });
  eleventyConfig.addGlobalData("atlas", atlas);

  // --- Templates: Nunjucks, every data string escaped ---
  eleventyConfig.setNunjucksEnvironmentOptions({ autoescape: true, throwOnUndefined: false });

  // --- Filters, URL rewriting and passthrough, registered as one plugin ---
  eleventyConfig.addPlugin(atlasPlugin);

  eleventyConfig.setQuietMode(true);

  return {
    // No output folder here: the build command passes a fresh staging folder.
    dir: { input: "templates", includes: "_includes" },
    templateFormats: ["njk"],
    htmlTemplateEngine: "njk",
    pathPrefix: atlas.pathPrefix,
  };
}
