// Sets "allowErrorForDataTypeAny": true in the generated functions.json, so that Excel still calls a function when a
// range argument holds an error cell and passes the error in its place: one error cell in a column then gives one
// error cell in the spilled result instead of an error for the whole formula. Every parameter here has type `any`.
// The metadata generator cannot write this option from JSDoc: the Office documentation says it works only in JSON
// metadata written by hand ("Errors as custom function inputs",
// https://learn.microsoft.com/office/dev/add-ins/excel/custom-functions-errors#errors-as-custom-function-inputs;
// the property: https://learn.microsoft.com/office/dev/add-ins/excel/custom-functions-json#allowerrorfordatatypeany),
// hence this step after generation.

const { Compilation, sources } = require("webpack");

class ErrorCellsMetadataPlugin {
  constructor(file = "functions.json") {
    this.file = file;
  }

  apply(compiler) {
    compiler.hooks.thisCompilation.tap("ErrorCellsMetadataPlugin", (compilation) => {
      compilation.hooks.processAssets.tap(
        { name: "ErrorCellsMetadataPlugin", stage: Compilation.PROCESS_ASSETS_STAGE_ADDITIONAL },
        () => {
          const asset = compilation.getAsset(this.file);
          if (!asset) return;
          const metadata = JSON.parse(asset.source.source().toString());
          const updated = { allowErrorForDataTypeAny: true, ...metadata };
          compilation.updateAsset(this.file, new sources.RawSource(JSON.stringify(updated, null, 4)));
        },
      );
    });
  }
}

module.exports = { ErrorCellsMetadataPlugin };
