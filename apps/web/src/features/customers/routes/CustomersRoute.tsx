import { Button, Stack } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconPlus } from '@tabler/icons-react';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '../../../components/PageHeader';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { SearchInput } from '../../../components/SearchInput';
import { hrefs } from '../../../config/paths';
import { useAddressList } from '../../../lib/use-address-list';
import { useCustomers } from '../api/get-customers';
import { CustomerFormModal } from '../components/CustomerFormModal';
import { CustomersTable, PAGE_SIZES } from '../components/CustomersTable';

/** Who the company works for: searched, sorted and paged by the API; the filters live in the address. */
export function CustomersRoute() {
  const navigate = useNavigate();
  const { update, query, setQuery, q, sort, page, pageSize } = useAddressList({
    defaultSort: 'name',
    pageSizes: PAGE_SIZES,
  });
  const [addOpened, add] = useDisclosure(false);

  const customers = useCustomers({ q, sort, page, pageSize });

  return (
    <>
      <PageHeader
        title="Customers"
        description="Who the roofs are for: their contact, where the invoice goes, and their jobs."
        actions={
          <Button leftSection={<IconPlus size={18} />} onClick={add.open}>
            New customer
          </Button>
        }
      />
      <Stack gap="sm">
        <SearchInput
          label="Search customers"
          placeholder="Name, contact or e-mail"
          value={query}
          onChange={setQuery}
          width={320}
        />
        {customers.isPending ? (
          <PageLoader label="Loading customers…" />
        ) : customers.isError ? (
          <QueryError
            what="the customers"
            error={customers.error}
            onRetry={() => void customers.refetch()}
            retrying={customers.isFetching}
          />
        ) : (
          <CustomersTable
            customers={customers.data.items}
            total={customers.data.total}
            page={page}
            pageSize={pageSize}
            sort={sort}
            fetching={customers.isFetching}
            emptyText={
              q !== ''
                ? 'No customer matches. Clear the search, or add them with “New customer”.'
                : 'No customers yet. Add one with “New customer”, or with a new job.'
            }
            onPageChange={(p) => update({ page: String(p) })}
            onPageSizeChange={(size) => update({ size: String(size), page: null })}
            onSortChange={(s) => update({ sort: s, page: null })}
            onOpen={(c) => navigate(hrefs.customer(c.id))}
          />
        )}
      </Stack>
      <CustomerFormModal
        opened={addOpened}
        onClose={add.close}
        customer={null}
        onSaved={(c) => navigate(hrefs.customer(c.id))}
      />
    </>
  );
}
