// Small enhancements only; every page works without script.
// A form with data-confirm asks before it is sent.
for (const form of document.querySelectorAll('form[data-confirm]')) {
  form.addEventListener('submit', (event) => {
    if (!window.confirm(form.dataset.confirm)) {
      event.preventDefault();
    }
  });
}
// The search box takes focus when the page is a search without a query.
const query = document.getElementById('q');
if (query && query.value === '') {
  query.focus();
}
