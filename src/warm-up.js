// Runs while main's chunks are still downloading (scripts/preload-initial.mjs makes it a module with
// no imports: it runs as soon as it arrives, before main and its chunks have all come). The first
// date-type input a document makes costs Chromium 20–40 ms on this machine (its date formats load
// once per document), and Angular Material's matInput makes one in the sign-in page's first render
// (the CDK's `getSupportedInputTypes` tries every input type): paid here, that render's long task
// is shorter and the time overlaps the network instead of the first paint.
globalThis.document?.createElement('input').setAttribute('type', 'date');
