const args = process.argv.slice(2);
if (args[0] === 'solve') {
  console.log('solve');
} else {
  const { runSmoke } = await import('./ui/smoke.js');
  await runSmoke();
}
