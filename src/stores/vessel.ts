import type { Vessel } from '@shared/schemas/vessels';
import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import { listVessels } from '@/api/vessels';

const STORAGE_KEY = 'shipkeeper.currentVessel';

/** The vessels the organisation keeps and the one the staff workspace is showing. */
export const useVesselStore = defineStore('vessel', () => {
  const vessels = ref<Vessel[]>([]);
  const loaded = ref(false);
  const currentId = ref<number | null>(Number(localStorage.getItem(STORAGE_KEY)) || null);

  const current = computed(() => vessels.value.find((v) => v.id === currentId.value) ?? vessels.value[0] ?? null);

  async function load() {
    const page = await listVessels({ page: 1, pageSize: 100, sort: 'name' });
    vessels.value = page.items;
    loaded.value = true;
    if (!vessels.value.some((v) => v.id === currentId.value)) select(vessels.value[0]?.id ?? null);
  }

  function select(id: number | null) {
    currentId.value = id;
    if (id === null) localStorage.removeItem(STORAGE_KEY);
    else localStorage.setItem(STORAGE_KEY, String(id));
  }

  function reset() {
    vessels.value = [];
    loaded.value = false;
  }

  return { vessels, loaded, currentId, current, load, select, reset };
});
