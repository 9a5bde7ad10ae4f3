// Eleventy wiring for Sublevel Atlas. It only connects parts. Eleventy renders
// the site-wide pages (templates/*.njk); the build (src/build/build.ts) runs
// it after the species pages are written and hands it the small site summary
// as the global data `atlas`. See DEVELOPERS.md, "How data flows".

export default async function (eleventyConfig) {
  const { atlasPlugin } = await import("./src/site/eleventyPlugin.ts");

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
  };
}
