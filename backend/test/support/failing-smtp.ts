// Imported first by a test file: nothing listens on port 9 (discard) here, so every delivery
// is refused. The environment is read when the app module loads, so this must come before it.
process.env.SMTP_URL = 'smtp://127.0.0.1:9';
