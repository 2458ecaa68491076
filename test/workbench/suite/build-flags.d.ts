// Constants the bundler defines (test/workbench/build-suite.mjs).
declare const __ASSAY_BREAK__: boolean;
declare const __ASSAY_GREP__: string;
