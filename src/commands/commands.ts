// Ribbon commands. The ribbon button opens the task pane through a ShowTaskpane action declared in manifest.xml;
// the function below is the same action for command surfaces that can only run a function.

/** Opens the task pane (shared runtime API) and completes the ribbon event. */
async function showRedoxPane(event?: Office.AddinCommands.Event): Promise<void> {
  try {
    await Office.addin.showAsTaskpane();
  } finally {
    event?.completed();
  }
}

if (typeof Office !== "undefined") {
  void Office.onReady(() => {
    if (Office.actions) Office.actions.associate("showRedoxPane", showRedoxPane);
  });
}
