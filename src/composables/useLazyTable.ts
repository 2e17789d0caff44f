import type { DataTablePageEvent, DataTableSortEvent } from 'primevue/datatable';
import { computed, ref } from 'vue';

/** Page and sort state of a DataTable whose rows the server pages and sorts (`sort` as the API takes it). */
export function useLazyTable(defaultSort: string, pageSize = 25) {
  const page = ref(1);
  const rows = ref(pageSize);
  const sort = ref(defaultSort);

  const first = computed(() => (page.value - 1) * rows.value);
  const sortField = computed(() => sort.value.replace(/^-/, ''));
  const sortOrder = computed(() => (sort.value.startsWith('-') ? -1 : 1));
  /** The paging part of the list request. */
  const params = computed(() => ({ page: page.value, pageSize: rows.value, sort: sort.value }));

  function onPage(event: DataTablePageEvent) {
    page.value = event.page + 1;
    rows.value = event.rows;
  }

  function onSort(event: DataTableSortEvent) {
    const field = typeof event.sortField === 'string' ? event.sortField : null;
    sort.value = field ? `${event.sortOrder === -1 ? '-' : ''}${field}` : defaultSort;
    page.value = 1;
  }

  function firstPage() {
    page.value = 1;
  }

  return { page, rows, sort, first, sortField, sortOrder, params, onPage, onSort, firstPage };
}

export type LazyTable = ReturnType<typeof useLazyTable>;
